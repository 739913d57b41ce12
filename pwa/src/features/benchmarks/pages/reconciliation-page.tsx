import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { ProjectReconciliation } from '../components/project-reconciliation';

/** The client's read-only reconciliation: the same figures and cautions as the lead's, nothing to change. */
export function ReconciliationPage() {
  return (
    <PageFrame
      title="Other polls"
      lead="This project's weighted share reconciled with other published polls on the same question: the likely true share, each method group's bias factor and each poll's chance-outlier probability. Read-only."
    >
      <ChosenProjectView needs="The reconciliation" emptyNote="Projects the agency shares with you will appear here.">
        {(project) => <ProjectReconciliation key={project.id} projectId={project.id} canChange={false} />}
      </ChosenProjectView>
    </PageFrame>
  );
}
