import { PageFrame } from '../../../components/page-frame';
import { ProjectBalance } from '../components/project-balance';

/** The client's read-only page: the same balance figures as the lead's, nothing to change. */
export function ProgressPage() {
  return (
    <PageFrame
      title="Progress"
      lead="How fieldwork is going on the projects shared with you: interviews so far and how well the sample matches the population. Read-only."
    >
      <ProjectBalance emptyNote="Projects the agency shares with you will appear here." />
    </PageFrame>
  );
}
