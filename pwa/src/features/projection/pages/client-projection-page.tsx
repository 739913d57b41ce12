import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { ProjectionView } from '../components/projection-view';

/** The client's read-only projection: the lead's figures, nothing to change. */
export function ClientProjectionPage() {
  return (
    <PageFrame title="Projection" lead="Where fieldwork on the projects shared with you ends if the recent pace continues. Read-only.">
      <ChosenProjectView needs="The projection" emptyNote="Projects the agency shares with you will appear here.">
        {(project) => <ProjectionView key={project.id} projectId={project.id} />}
      </ChosenProjectView>
    </PageFrame>
  );
}
