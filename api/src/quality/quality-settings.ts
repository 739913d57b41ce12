// What the lead can set per project for each quality rule, with the defaults a new project gets.
// projects.quality_settings keeps only the lead's changes; `qualitySettings` merges them over
// the defaults, so a project that never changed a rule follows the default.

export interface QualitySettings {
  tooShort: { enabled: boolean; /** A complete shorter than this share of the project's median complete. */ fractionOfMedian: number; /** Or shorter than this many minutes, when set. */ minimumMinutes: number | null };
  overlapping: { enabled: boolean };
  outOfHours: { enabled: boolean; /** Local time of day, HH:MM, in the project's time zone. */ from: string; to: string };
  bursts: { enabled: boolean; /** More than this many completes by one interviewer within an hour. */ perHour: number };
  interviewerAnswers: { enabled: boolean; /** Interviewers with fewer completes are not tested. */ minimumCompletes: number; /** False discovery rate (Benjamini–Hochberg). */ falseDiscoveryRate: number };
  backChecks: {
    enabled: boolean;
    /** Share of each interviewer's completes selected for a call-back. */
    share: number;
    /** Added to an interviewer's share for the rest of the field period after a back-check does not confirm. */
    raiseAfterNotConfirmed: number;
    /** Respondent references are deleted this many days after the back-check's outcome. */
    keepReferenceDays: number;
  };
}

export const DEFAULT_QUALITY_SETTINGS: QualitySettings = {
  // A third of the median (common practice, no source).
  tooShort: { enabled: true, fractionOfMedian: 1 / 3, minimumMinutes: null },
  overlapping: { enabled: true },
  outOfHours: { enabled: true, from: '08:00', to: '21:00' },
  bursts: { enabled: true, perHour: 4 },
  interviewerAnswers: { enabled: true, minimumCompletes: 20, falseDiscoveryRate: 0.1 },
  // 10% of completes called back (common practice, no source); a failed one doubles an
  // interviewer's share (our default); references kept 30 days after the back-check.
  backChecks: { enabled: true, share: 0.1, raiseAfterNotConfirmed: 0.1, keepReferenceDays: 30 },
};

type Stored = { [K in keyof QualitySettings]?: Partial<QualitySettings[K]> };

/** The project's settings: its stored changes merged over the defaults, rule by rule. */
export function qualitySettings(stored: Record<string, unknown> | null | undefined): QualitySettings {
  const changes = (stored ?? {}) as Stored;
  const merged = {} as Record<keyof QualitySettings, unknown>;
  for (const key of Object.keys(DEFAULT_QUALITY_SETTINGS) as (keyof QualitySettings)[]) {
    merged[key] = { ...DEFAULT_QUALITY_SETTINGS[key], ...(changes[key] ?? {}) };
  }
  return merged as QualitySettings;
}
