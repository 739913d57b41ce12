import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { useBenchmarks } from '../api/get-benchmarks';
import { PollList } from '../components/poll-list';
import { ProjectReconciliation } from '../components/project-reconciliation';

/** The lead's benchmarks: other polls on the same question and the reconciliation with them. */
export function BenchmarksPage() {
  return (
    <PageFrame
      title="Benchmarks"
      lead="Other polls on the same question, by method group, reconciled with this project's weighted share: the likely true share, each group's bias factor and each poll's chance-outlier probability."
    >
      <ChosenProjectView needs="Benchmarks" emptyNote="Set up a project first; record other polls on its question here.">
        {(project) => (
          <div key={project.id}>
            <ProjectReconciliation projectId={project.id} canChange />
            <section className="pl-section" aria-labelledby="pl-polls-heading">
              <h2 id="pl-polls-heading" className="pl-section-title">Other polls</h2>
              <Polls projectId={project.id} />
            </section>
          </div>
        )}
      </ChosenProjectView>
    </PageFrame>
  );
}

function Polls({ projectId }: { projectId: string }) {
  const query = useBenchmarks(projectId);
  return (
    <QueryView query={query} what="the polls" offlineNote="The polls need the network." isEmpty={() => false} empty={null}>
      {(data) => <PollList projectId={projectId} polls={data.polls} />}
    </QueryView>
  );
}
