import { Link, useParams } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { QuotaBoard } from '../components/quota-board';

/** The lead's view of one project's board, reached from the project page. */
export function ProjectQuotaBoardPage() {
  const { projectId = '' } = useParams();
  return (
    <PageFrame title="Quota board" lead="Every cell of the project: what is achieved, what is still to find, and who is finding it.">
      <p>
        <Link to={`/lead/projects/${projectId}`} className="pl-back-link">
          ← Back to the project
        </Link>
      </p>
      <QuotaBoard projectId={projectId} />
    </PageFrame>
  );
}
