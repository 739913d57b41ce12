// How the demo's interviewers work, so the quality rules have something to find after
// `npm start`: most work steadily; one speeds through completes, one rushes with overlapping
// interviews and bursts of completes, one starts some days before 08:00, and one's headline
// answers lean towards yes. Each habit takes the draw the steady pace would take from the
// seeded generator, so everyone else's interviews stay exactly as they were. All invented.

export interface Habits {
  /** Minutes a complete takes, from one uniform draw. */
  completeMinutes: (u: number) => number;
  /** Minutes between the end of a contact of `took` minutes and the next start (negative: overlapping). */
  gapMinutes: (u: number, took: number) => number;
  /** Hour of the day's first contact (UTC, about London time), from one uniform draw. */
  firstHour: (u: number, day: number) => number;
  /** Share of this interviewer's "no" answers recorded as "yes" instead. */
  lean: number;
}

export const STEADY: Habits = {
  completeMinutes: (u) => 12 + u * 14,
  gapMinutes: (u) => 3 + u * 12,
  firstHour: (u) => 9.5 + u * 2,
  lean: 0,
};

export const DEMO_HABITS: Record<string, Partial<Habits>> = {
  // Too short: over half of the completes take 2.5 to 5 minutes, far under a third of the median.
  'd.rourke@vellmoor.example': { completeMinutes: (u) => (u < 0.55 ? 2.5 + u * 4.5 : 12 + u * 14) },
  // Overlapping and bursts: quick completes, contacts begun before the last one ended, short breaks.
  'f.mbeki@vellmoor.example': {
    completeMinutes: (u) => 8 + u * 6,
    gapMinutes: (u, took) => (u < 0.4 ? -Math.min(took / 2, 2 + u * 10) : 1 + u * 3),
  },
  // Out of hours: on two days the first contacts start before 08:00.
  'e.varga@vellmoor.example': { firstHour: (u, day) => (day === 3 || day === 9 ? 6.9 + u * 0.6 : 9.5 + u * 2) },
  // Headline answers that lean: half of the "no" answers become "yes".
  'g.tallis@vellmoor.example': { lean: 0.5 },
};

export const habitsOf = (email: string): Habits => ({ ...STEADY, ...DEMO_HABITS[email] });
