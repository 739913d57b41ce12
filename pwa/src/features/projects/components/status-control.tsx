import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import type { Project } from '../../../lib/projects/get-projects';
import { useUpdateProject, type ProjectStatus } from '../api/update-project';
import { ArchiveControl } from './archive-control';

export const statusWords: Record<string, string> = {
  setup: 'Being set up',
  fieldwork: 'In the field',
  closed: 'Field closed',
};

interface Move {
  to: ProjectStatus;
  label: string;
  question: string;
  /** What happens to phones and interviews, in words. */
  effect: string;
}

const moves: Record<ProjectStatus, Move[]> = {
  setup: [
    {
      to: 'fieldwork',
      label: 'Start fieldwork',
      question: 'Start fieldwork?',
      effect:
        'Interviewers on the team get the cells at their next sync and can log contacts. Targets can still be changed; every interview logged is kept.',
    },
  ],
  fieldwork: [
    {
      to: 'closed',
      label: 'Close fieldwork',
      question: 'Close fieldwork?',
      effect:
        'Interviewers see the project as closed. Interviews still on their phones are accepted when they sync and marked as sent after closing, so nothing logged is lost.',
    },
    {
      to: 'setup',
      label: 'Back to set-up',
      question: 'Move the project back to set-up?',
      effect:
        'Every interview logged so far is kept and still counts, and phones can still send what they hold. Use this to rework targets or the team; saving new targets recomputes the cells.',
    },
  ],
  closed: [
    {
      to: 'fieldwork',
      label: 'Reopen fieldwork',
      question: 'Reopen fieldwork?',
      effect: 'Interviewers can log contacts again from their next sync; interviews sent while it was closed keep their mark.',
    },
  ],
};

/** The project's stage: set-up → in the field → closed, one step at a time, each asked first. */
export function StatusControl({ project }: { project: Project }) {
  const update = useUpdateProject(project.id);
  const [asking, setAsking] = useState<Move | null>(null);
  const current = (project.status in moves ? project.status : 'setup') as ProjectStatus;
  const close = () => {
    setAsking(null);
    update.reset();
  };
  return (
    <div className="pl-status-control">
      <p>
        Now: <strong>{statusWords[project.status] ?? project.status}</strong>
        {project.archivedAt ? <strong>, archived</strong> : null}
      </p>
      <div className="pl-form-actions">
        {(project.archivedAt ? [] : moves[current]).map((move) => (
          <button
            key={move.to}
            type="button"
            className={`pl-button ${move.to === 'setup' ? 'pl-button-quiet' : 'pl-button-main'} pl-button-small`}
            disabled={update.isPending}
            onClick={() => setAsking(move)}
          >
            {move.label}
          </button>
        ))}
        <ArchiveControl project={project} />
      </div>
      {asking ? (
        <ConfirmDialog
          title={asking.question}
          confirmLabel={asking.label}
          busy={update.isPending}
          problem={update.error?.message}
          onConfirm={() => update.mutate({ status: asking.to }, { onSuccess: () => setAsking(null) })}
          onCancel={close}
        >
          <p>{asking.effect}</p>
        </ConfirmDialog>
      ) : null}
    </div>
  );
}
