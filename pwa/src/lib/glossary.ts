// The product's words, each concept named once (DESIGN.md section 8, "Our words"). Screens
// take headings and labels from here so the lead, the supervisor and the interviewer read
// the same word for the same thing; README.md ("Words we use") lists them for users.

export interface Term {
  /** Singular, in running text (lower case unless a name). */
  one: string;
  many: string;
  /** What it means, in one sentence for users. */
  meaning: string;
}

export const WORDS = {
  quotaVariable: {
    one: 'quota variable',
    many: 'quota variables',
    meaning: 'A respondent characteristic the sample is balanced on, such as age band or district. It has a name shown on screens and a column name used in files.',
  },
  category: { one: 'category', many: 'categories', meaning: 'One value of a quota variable, such as 18-34, with its population share.' },
  cell: { one: 'cell', many: 'cells', meaning: 'A group of respondents with a target: one category, or one combination of categories.' },
  interlocked: {
    one: 'interlocked cell',
    many: 'interlocked cells',
    meaning: 'A cell for one combination of categories of the interlocked set, such as 18-34 × female.',
  },
  interlockedSet: {
    one: 'interlocked set',
    many: 'interlocked sets',
    meaning: 'The quota variables the lead chose to cross, so that every combination of their categories is its own cell.',
  },
  margin: {
    one: 'margin quota',
    many: 'margin quotas',
    meaning: 'A cell for one category of one variable on its own, whatever the respondent’s other categories.',
  },
  target: { one: 'target', many: 'targets', meaning: 'How many completes a cell should have by the end of fieldwork.' },
  achieved: { one: 'achieved', many: 'achieved', meaning: 'Completes counted in a cell so far: approved or awaiting review, not rejected.' },
  contact: {
    one: 'contact',
    many: 'contacts',
    meaning: 'Every attempt an interviewer logs, whatever its outcome: complete, partial, refusal, nobody reached …',
  },
  complete: { one: 'complete', many: 'completes', meaning: 'A contact that ended with the whole interview done; only completes count towards targets.' },
  interview: { one: 'interview', many: 'interviews', meaning: 'A complete, as quotas, the balance and the export count it.' },
  outbox: {
    one: 'outbox',
    many: 'outboxes',
    meaning: 'The contacts on a phone not yet received by the office (unsent interviews); they are kept until the office confirms them.',
  },
  unsent: { one: 'unsent interview', many: 'unsent interviews', meaning: 'A contact in the outbox, waiting to be sent.' },
  overQuota: { one: 'over quota', many: 'over quota', meaning: 'A complete logged in a cell that was already full or closed; kept for the supervisor to decide.' },
  flag: { one: 'flag', many: 'flags', meaning: 'A note the server puts on an interview a supervisor should look at, with its reason.' },
  retired: {
    one: 'retired category',
    many: 'retired categories',
    meaning: 'A category taken out of the targets once interviews were logged in it: its interviews are kept; it is closed for new ones.',
  },
  balance: { one: 'balance', many: 'balance', meaning: 'How far the sample so far is from the population targets, and what weighting costs.' },
} as const satisfies Record<string, Term>;

/** "interlocked cells" → "Interlocked cells", for headings and labels. */
export function heading(words: string): string {
  return words.charAt(0).toUpperCase() + words.slice(1);
}
