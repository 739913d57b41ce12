import { useState, type FormEvent, type ReactNode } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { isApiError } from '../../../lib/api-error';
import type { NewProject } from '../api/create-project';
import { checkDraft, type DraftProblems, type ProjectDraft } from './project-form-checks';
import { TextField } from './text-field';

/** Every zone the browser knows, with the chosen one first if it is missing from the list. */
function timeZones(chosen: string): string[] {
  const known = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return known.includes(chosen) ? known : [chosen, ...known];
}

interface ProjectFactsFormProps {
  initial: ProjectDraft;
  submitLabel: string;
  busyLabel: string;
  busy: boolean;
  error: Error | null;
  onSubmit: (project: NewProject) => void;
  /** Extra buttons beside the submit button (e.g. Cancel). */
  actions?: ReactNode;
  /** A note above the buttons on what saving changes. */
  note?: ReactNode;
}

/** A project's facts: name, topic, field dates, sample size, headline question and time zone. */
export function ProjectFactsForm({ initial, submitLabel, busyLabel, busy, error, onSubmit, actions, note }: ProjectFactsFormProps) {
  const [draft, setDraft] = useState<ProjectDraft>(initial);
  const [problems, setProblems] = useState<DraftProblems>({});
  const set = (field: keyof ProjectDraft) => (event: { target: { value: string } }) => setDraft({ ...draft, [field]: event.target.value });
  const serverFields = isApiError(error) ? error.fields : [];
  const serverProblem = (field: string) => serverFields.find((f) => f.field === field)?.message;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = checkDraft(draft);
    setProblems(checked.problems);
    if (checked.project) onSubmit(checked.project);
  };

  return (
    <form className="pl-form pl-project-form" onSubmit={submit} noValidate>
      <TextField label="Project name" value={draft.name} onChange={set('name')} problem={problems.name ?? serverProblem('name')} />
      <TextField label="Topic" value={draft.topic} onChange={set('topic')} hint="Optional: one line on what the survey is about." />
      <div className="pl-field-pair">
        <TextField label="Field start" type="date" value={draft.fieldStart} onChange={set('fieldStart')} problem={problems.fieldStart ?? serverProblem('fieldStart')} />
        <TextField label="Field end" type="date" value={draft.fieldEnd} onChange={set('fieldEnd')} problem={problems.fieldEnd ?? serverProblem('fieldEnd')} />
      </div>
      <TextField
        label="Target sample size"
        inputMode="numeric"
        value={draft.targetSize}
        onChange={set('targetSize')}
        problem={problems.targetSize ?? serverProblem('targetSize')}
        hint="Completed interviews wanted in total."
      />
      <TextField
        label="Headline question"
        value={draft.headlineQuestion}
        onChange={set('headlineQuestion')}
        problem={problems.headlineQuestion ?? serverProblem('headlineQuestion')}
        hint="The yes/no question whose share the project reports."
      />
      <div className="pl-field">
        <label htmlFor="pl-time-zone">Time zone</label>
        <select id="pl-time-zone" className="pl-select" value={draft.timeZone} onChange={set('timeZone')} aria-describedby="pl-time-zone-note">
          {timeZones(draft.timeZone).map((zone) => (
            <option key={zone} value={zone}>
              {zone.replaceAll('_', ' ')}
            </option>
          ))}
        </select>
        <span id="pl-time-zone-note" className={serverProblem('timeZone') ? 'pl-field-problem' : 'pl-small pl-muted'}>
          {serverProblem('timeZone') ?? 'Where the fieldwork happens: field days and “today” on the quota board follow this zone.'}
        </span>
      </div>
      {note}
      <FormProblem message={error?.message} />
      <div className="pl-form-actions">
        {actions}
        <button type="submit" className="pl-button pl-button-main" disabled={busy}>
          {busy ? busyLabel : submitLabel}
        </button>
      </div>
    </form>
  );
}
