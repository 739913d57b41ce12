import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import type { Project } from '../../../lib/projects/get-projects';
import { useDuplicateProject } from '../api/duplicate-project';

/** Starts the next wave from this project: asks first, then opens the copy. */
export function DuplicateProject({ project }: { project: Project }) {
  const [asking, setAsking] = useState(false);
  const duplicate = useDuplicateProject(project.id);
  const navigate = useNavigate();
  const close = () => {
    setAsking(false);
    duplicate.reset();
  };
  return (
    <>
      <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={() => setAsking(true)}>
        Duplicate for a new wave
      </button>
      {asking ? (
        <ConfirmDialog
          title="Duplicate this project?"
          confirmLabel={duplicate.isPending ? 'Duplicating…' : 'Duplicate'}
          busy={duplicate.isPending}
          problem={duplicate.error?.message}
          onConfirm={() => duplicate.mutate(undefined, { onSuccess: (copy) => navigate(`/lead/projects/${copy.id}`) })}
          onCancel={close}
        >
          <p>
            A new project, “{project.name} (copy)”, in set-up with the same details, quota targets and team, and none of
            this project’s interviews. Change its name and field dates there; this project stays as it is.
          </p>
        </ConfirmDialog>
      ) : null}
    </>
  );
}
