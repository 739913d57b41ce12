// What the lead can set per project for each quality rule, with the defaults a new project gets.

export interface QualitySettings {
  tooShort: { enabled: boolean; /** A complete shorter than this share of the project's median complete. */ fractionOfMedian: number; /** Or shorter than this many minutes, when set. */ minimumMinutes: number | null };
  overlapping: { enabled: boolean };
  outOfHours: { enabled: boolean; /** Local time of day, HH:MM, in the project's time zone. */ from: string; to: string };
  bursts: { enabled: boolean; /** More than this many completes by one interviewer within an hour. */ perHour: number };
  interviewerAnswers: { enabled: boolean; /** Interviewers with fewer completes are not tested. */ minimumCompletes: number; /** False discovery rate (Benjamini–Hochberg). */ falseDiscoveryRate: number };
}

export const DEFAULT_QUALITY_SETTINGS: QualitySettings = {
  // A third of the median (common practice, no source).
  tooShort: { enabled: true, fractionOfMedian: 1 / 3, minimumMinutes: null },
  overlapping: { enabled: true },
  outOfHours: { enabled: true, from: '08:00', to: '21:00' },
  bursts: { enabled: true, perHour: 4 },
  interviewerAnswers: { enabled: true, minimumCompletes: 20, falseDiscoveryRate: 0.1 },
};
