import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import type { Project } from '../../../lib/projects/get-projects';
import { useArchiveProject } from '../api/archive-project';

const asks = {
  archive: {
    label: 'Archive',
    question: 'Archive this project?',
    effect:
      'It is hidden from the project lists and pickers and from interviewers’ phones, which stop offering it for new contacts; anything a phone has not sent yet is still accepted when it syncs. The project and its interviews are kept, read-only. You can restore it at any time: it comes back closed.',
  },
  restore: {
    label: 'Restore',
    question: 'Restore this project?',
    effect: 'It comes back to the project lists, closed, and can be changed again. Interviewers see it at their next sync.',
  },
} as const;

/** Archive a closed project, or restore an archived one: asked first, saying what happens. */
export function ArchiveControl({ project }: { project: Project }) {
  const change = useArchiveProject(project.id);
  const [asking, setAsking] = useState<'archive' | 'restore' | null>(null);
  const action = project.archivedAt ? 'restore' : project.status === 'closed' ? 'archive' : null;
  if (!action) return null;
  const close = () => {
    setAsking(null);
    change.reset();
  };
  return (
    <>
      <button type="button" className={`pl-button ${action === 'restore' ? 'pl-button-main' : 'pl-button-quiet'} pl-button-small`} onClick={() => setAsking(action)}>
        {asks[action].label}
      </button>
      {asking ? (
        <ConfirmDialog
          title={asks[asking].question}
          confirmLabel={asks[asking].label}
          busy={change.isPending}
          problem={change.error?.message}
          onConfirm={() => change.mutate(asking, { onSuccess: () => setAsking(null) })}
          onCancel={close}
        >
          <p>{asks[asking].effect}</p>
        </ConfirmDialog>
      ) : null}
    </>
  );
}
