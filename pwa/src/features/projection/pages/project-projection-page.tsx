import { Link, useParams } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { ProjectionView } from '../components/projection-view';

/** The lead's projection of one project, reached from the project page. */
export function ProjectProjectionPage() {
  const { projectId = '' } = useParams();
  return (
    <PageFrame title="Projection" lead="Where fieldwork ends if the recent pace continues: the total at the field end, when the target is reached, and the cells at risk.">
      <p>
        <Link to={`/lead/projects/${projectId}`} className="pl-back-link">
          ← Back to the project
        </Link>
      </p>
      <ProjectionView projectId={projectId} />
    </PageFrame>
  );
}
