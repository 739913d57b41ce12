import { Link, useParams } from 'react-router-dom';
import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { useProjects } from '../../../lib/projects/get-projects';
import { ReviewQueue } from '../components/review-queue';

const lead = 'Interviews to look at, flagged ones first: approve or reject them with a reason; every decision is kept.';

/** The supervisor's review queue for the chosen project (the choice is remembered). */
export function ReviewQueuePage() {
  return (
    <PageFrame title="Review queue" lead={lead}>
      <ChosenProjectView needs="The review queue" emptyNote="Once a project lead adds you to a project, its interviews appear here.">
        {(project) => <ReviewQueue key={project.id} projectId={project.id} projectName={project.name} />}
      </ChosenProjectView>
    </PageFrame>
  );
}

/** The lead's review queue of one project, reached from the project page. */
export function ProjectReviewQueuePage() {
  const { projectId = '' } = useParams();
  const name = useProjects().data?.find((p) => p.id === projectId)?.name ?? 'project';
  return (
    <PageFrame title="Review queue" lead={lead}>
      <p>
        <Link to={`/lead/projects/${projectId}`} className="pl-back-link">
          ← Back to the project
        </Link>
      </p>
      <ReviewQueue projectId={projectId} projectName={name} />
    </PageFrame>
  );
}
