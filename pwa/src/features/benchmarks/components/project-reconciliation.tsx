import './benchmarks.css';
import { QueryView } from '../../../components/query-view';
import { useReconciliation } from '../api/get-reconciliation';
import { ReconciledFigures } from './reconciled-figures';
import { ReconciliationCautions } from './reconciliation-cautions';

/** The reconciliation of one project: figures then cautions; the lead may change the spread prior. */
export function ProjectReconciliation({ projectId, canChange }: { projectId: string; canChange: boolean }) {
  const query = useReconciliation(projectId);
  return (
    <QueryView query={query} what="the reconciliation" offlineNote="The reconciliation needs the network." isEmpty={() => false} empty={null}>
      {(r) => (
        <>
          <section className="pl-section" aria-labelledby="pl-reconciled-heading">
            <h2 id="pl-reconciled-heading" className="pl-section-title">Reconciliation</h2>
            <ReconciledFigures reconciliation={r} />
          </section>
          <ReconciliationCautions projectId={projectId} reconciliation={r} canChange={canChange} />
        </>
      )}
    </QueryView>
  );
}
