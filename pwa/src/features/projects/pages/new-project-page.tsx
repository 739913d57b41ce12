import '../components/project-setup.css';
import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { isApiError } from '../../../lib/api-error';
import { useCreateProject } from '../api/create-project';
import { checkDraft, deviceTimeZone, emptyDraft, type DraftProblems, type ProjectDraft } from '../components/project-form-checks';
import { TextField } from '../components/text-field';
import { FormProblem } from '../../../components/form-problem';

/** Every zone the browser knows, with the chosen one first if it is missing from the list. */
function timeZones(chosen: string): string[] {
  const known = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return known.includes(chosen) ? known : [chosen, ...known];
}

/** The lead starts a project: its facts first; targets and team come on the project page. */
export function NewProjectPage() {
  const navigate = useNavigate();
  const create = useCreateProject();
  const [draft, setDraft] = useState<ProjectDraft>(() => ({ ...emptyDraft, timeZone: deviceTimeZone() }));
  const [problems, setProblems] = useState<DraftProblems>({});
  const set = (field: keyof ProjectDraft) => (event: { target: { value: string } }) => setDraft({ ...draft, [field]: event.target.value });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const checked = checkDraft(draft);
    setProblems(checked.problems);
    if (!checked.project) return;
    create.mutate(checked.project, { onSuccess: (project) => navigate(`/lead/projects/${project.id}`) });
  };
  const serverFields = isApiError(create.error) ? create.error.fields : [];
  const serverProblem = (field: string) => serverFields.find((f) => f.field === field)?.message;

  return (
    <PageFrame title="New project" lead="The facts of the project. Quota targets and the team come next, on the project's own page.">
      <p>
        <Link to="/lead" className="pl-back-link">
          ← All projects
        </Link>
      </p>
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
        <FormProblem message={create.error?.message} />
        <div className="pl-form-actions">
          <button type="submit" className="pl-button pl-button-main" disabled={create.isPending}>
            {create.isPending ? 'Creating…' : 'Create project'}
          </button>
        </div>
      </form>
    </PageFrame>
  );
}
