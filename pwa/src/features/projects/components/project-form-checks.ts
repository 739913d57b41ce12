import type { NewProject } from '../api/create-project';

export interface ProjectDraft {
  name: string;
  topic: string;
  fieldStart: string;
  fieldEnd: string;
  targetSize: string;
  headlineQuestion: string;
  timeZone: string;
}

/** The zone this device runs in: the usual starting point for a team that works nearby. */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

export const emptyDraft: ProjectDraft = {
  name: '',
  topic: '',
  fieldStart: '',
  fieldEnd: '',
  targetSize: '',
  headlineQuestion: '',
  timeZone: 'UTC',
};

export type DraftProblems = Partial<Record<keyof ProjectDraft, string>>;

/** Checks what the person typed before anything is sent; the server checks again. */
export function checkDraft(draft: ProjectDraft): { project?: NewProject; problems: DraftProblems } {
  const problems: DraftProblems = {};
  if (!draft.name.trim()) problems.name = 'Give the project a name.';
  if (!draft.fieldStart) problems.fieldStart = 'Choose the first field day.';
  if (!draft.fieldEnd) problems.fieldEnd = 'Choose the last field day.';
  if (draft.fieldStart && draft.fieldEnd && draft.fieldEnd < draft.fieldStart) problems.fieldEnd = 'The last field day cannot be before the first.';
  const size = Number(draft.targetSize);
  if (!/^\d+$/.test(draft.targetSize.trim()) || size < 1) problems.targetSize = 'Enter a whole number of interviews, at least 1.';
  else if (size > 1_000_000) problems.targetSize = 'At most 1,000,000 interviews.';
  if (!draft.headlineQuestion.trim()) problems.headlineQuestion = 'Write the yes/no question whose share the project reports.';
  if (Object.keys(problems).length > 0) return { problems };
  return {
    problems,
    project: {
      name: draft.name.trim(),
      topic: draft.topic.trim() || undefined,
      fieldStart: draft.fieldStart,
      fieldEnd: draft.fieldEnd,
      targetSize: size,
      headlineQuestion: draft.headlineQuestion.trim(),
      timeZone: draft.timeZone,
    },
  };
}
