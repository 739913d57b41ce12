import { Link, useParams } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { InterviewerRatesSection } from '../components/interviewer-rates';

/** The lead's view of one project's interviewers, reached from the project page. */
export function ProjectInterviewersPage() {
  const { projectId = '' } = useParams();
  return (
    <PageFrame title="Interviewers" lead="Each interviewer’s contacts, outcomes and rates, per field day too, with their flags and back-checks.">
      <p>
        <Link to={`/lead/projects/${projectId}`} className="pl-back-link">
          ← Back to the project
        </Link>
      </p>
      <InterviewerRatesSection projectId={projectId} />
    </PageFrame>
  );
}
