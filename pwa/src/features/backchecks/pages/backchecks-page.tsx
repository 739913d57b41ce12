// The supervisor's back-checks: for the chosen project, the interviews selected for a call-back
// (pending first), what to ask about on the call, and a small form to record what was found.
import { ChosenProjectView } from '../../../components/chosen-project-view';
import { PageFrame } from '../../../components/page-frame';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { formatPercent } from '../../../lib/format';
import { useBackchecks, type BackcheckList } from '../api/get-backchecks';
import { BackcheckCard } from '../components/backcheck-card';
import '../backchecks.css';

export function BackchecksPage() {
  return (
    <PageFrame title="Back-checks" lead="Call back a sample of completes to confirm the interview took place as recorded.">
      <ChosenProjectView needs="The back-check list" emptyNote="Once a project lead adds you to a project, its back-checks appear here.">
        {(project) => <ProjectBackchecks key={project.id} projectId={project.id} />}
      </ChosenProjectView>
    </PageFrame>
  );
}

function ProjectBackchecks({ projectId }: { projectId: string }) {
  const list = useBackchecks(projectId);
  return (
    <QueryView
      query={list}
      what="the back-checks"
      offlineNote="The back-check list needs the network."
      isEmpty={(data) => data.backchecks.length === 0}
      empty={
        <EmptyPanel title="No back-checks yet">
          <p>Interviews are selected as completes arrive.</p>
        </EmptyPanel>
      }
    >
      {(data) => <Lists projectId={projectId} data={data} />}
    </QueryView>
  );
}

function Lists({ projectId, data }: { projectId: string; data: BackcheckList }) {
  const pending = data.backchecks.filter((b) => b.outcome === null);
  const done = data.backchecks.filter((b) => b.outcome !== null);
  return (
    <>
      <p className="pl-backcheck-note">
        How they are chosen: {formatPercent(data.share, 0)} of each interviewer’s completes, and at least one per interviewer, decided
        once when each interview arrives, so the list never reshuffles. After a back-check that does not confirm, that interviewer’s
        share rises by {Math.round(data.raiseAfterNotConfirmed * 100)} percentage points for the rest of the field period.
      </p>
      <p className="pl-backcheck-note">
        The reference is a code from your agency’s contact sheet. It is still pseudonymous personal data (GDPR Recital 26): Plumbline
        keeps no names, addresses or phone numbers, and deletes each reference {data.keepReferenceDays} days after its back-check.
      </p>
      <h2 className="pl-section-title">Pending ({pending.length})</h2>
      {pending.length ? (
        <ul className="pl-card-list" aria-label="Pending back-checks">
          {pending.map((check) => <BackcheckCard key={check.interviewId} projectId={projectId} check={check} />)}
        </ul>
      ) : (
        <p>Nothing to call back now.</p>
      )}
      <h2 className="pl-section-title">Done ({done.length})</h2>
      {done.length ? (
        <ul className="pl-card-list" aria-label="Back-checks done">
          {done.map((check) => <BackcheckCard key={check.interviewId} projectId={projectId} check={check} />)}
        </ul>
      ) : (
        <p>No outcomes recorded yet.</p>
      )}
    </>
  );
}
