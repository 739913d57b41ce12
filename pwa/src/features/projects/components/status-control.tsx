import type { Project } from '../../../lib/projects/get-projects';
import { useUpdateProject, type ProjectStatus } from '../api/update-project';
import { FormProblem } from '../../../components/form-problem';

export const statusWords: Record<string, string> = {
  setup: 'Being set up',
  fieldwork: 'In the field',
  closed: 'Field closed',
};

const moves: Record<ProjectStatus, { to: ProjectStatus; label: string }[]> = {
  setup: [{ to: 'fieldwork', label: 'Start fieldwork' }],
  fieldwork: [
    { to: 'closed', label: 'Close fieldwork' },
    { to: 'setup', label: 'Back to set-up' },
  ],
  closed: [{ to: 'fieldwork', label: 'Reopen fieldwork' }],
};

/** The project's stage: set-up → in the field → closed, one step at a time. */
export function StatusControl({ project }: { project: Project }) {
  const update = useUpdateProject(project.id);
  const current = (project.status in moves ? project.status : 'setup') as ProjectStatus;
  return (
    <div className="pl-status-control">
      <p>
        Stage: <strong>{statusWords[project.status] ?? project.status}</strong>
      </p>
      <div className="pl-form-actions">
        {moves[current].map((move) => (
          <button
            key={move.to}
            type="button"
            className={`pl-button ${move.to === 'setup' ? 'pl-button-quiet' : 'pl-button-main'} pl-button-small`}
            disabled={update.isPending}
            onClick={() => update.mutate({ status: move.to })}
          >
            {move.label}
          </button>
        ))}
      </div>
      <FormProblem message={update.error?.message} />
    </div>
  );
}
