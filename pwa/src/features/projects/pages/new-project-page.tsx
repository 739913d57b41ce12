import '../components/project-setup.css';
import { Link, useNavigate } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { useCreateProject } from '../api/create-project';
import { ProjectFactsForm } from '../components/project-facts-form';
import { deviceTimeZone, emptyDraft } from '../components/project-form-checks';

/** The lead starts a project: its facts first; targets and team come on the project page. */
export function NewProjectPage() {
  const navigate = useNavigate();
  const create = useCreateProject();
  return (
    <PageFrame title="New project" lead="The facts of the project. Quota targets and the team come next, on the project's own page.">
      <p>
        <Link to="/lead" className="pl-back-link">
          ← All projects
        </Link>
      </p>
      <ProjectFactsForm
        initial={{ ...emptyDraft, timeZone: deviceTimeZone() }}
        submitLabel="Create project"
        busyLabel="Creating…"
        busy={create.isPending}
        error={create.error}
        onSubmit={(project) => create.mutate(project, { onSuccess: (created) => navigate(`/lead/projects/${created.id}`) })}
      />
    </PageFrame>
  );
}
