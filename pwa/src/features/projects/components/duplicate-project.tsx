import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { Dialog } from '../../../components/dialog';
import { FormProblem } from '../../../components/form-problem';
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
        <Dialog title="Duplicate this project?" onClose={close} placement="sheet">
          <p>
            A new project, “{project.name} (copy)”, in set-up with the same details, quota targets and team, and none of
            this project’s interviews. Change its name and field dates there; this project stays as it is.
          </p>
          <FormProblem message={duplicate.error?.message} />
          <div className="pl-dialog-actions">
            <button type="button" className="pl-button pl-button-quiet" onClick={close}>
              Cancel
            </button>
            <button
              type="button"
              className="pl-button pl-button-main"
              disabled={duplicate.isPending}
              onClick={() => duplicate.mutate(undefined, { onSuccess: (copy) => navigate(`/lead/projects/${copy.id}`) })}
            >
              {duplicate.isPending ? 'Duplicating…' : 'Duplicate'}
            </button>
          </div>
        </Dialog>
      ) : null}
    </>
  );
}
