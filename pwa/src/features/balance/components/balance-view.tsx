import './balance.css';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useStoredSession } from '../../../db/session-store';
import { useOnline } from '../../../hooks/use-online';
import { formatClock, formatCount } from '../../../lib/format';
import { useBalance, type Balance } from '../api/get-balance';
import { BalanceCautions } from './balance-cautions';
import { BalanceFigures } from './balance-figures';
import { FiguresMethods } from './figures-methods';
import { HeadlineShare } from './headline-share';
import { InterviewerEffect } from './interviewer-effect';
import { RetiredCategories } from './retired-categories';
import { SampleMix } from './sample-mix';

interface BalanceViewProps {
  projectId: string;
  targetSize: number;
}

/** One project's live balance. The same figures for the lead and, read-only, for clients. */
export function BalanceView({ projectId, targetSize }: BalanceViewProps) {
  const balance = useBalance(projectId);
  return (
    <QueryView
      query={balance}
      what="the balance"
      offlineNote="The balance needs the network. It will load as soon as you are back online."
      isEmpty={() => false}
      empty={null}
    >
      {(data) => <BalanceContent projectId={projectId} balance={data} targetSize={targetSize} checkedAt={balance.dataUpdatedAt} />}
    </QueryView>
  );
}

// "Updated" is when this screen last heard from the server (a 304 included), not the
// server's clock in the body: on a 304 the browser hands back the stored body unchanged.
function BalanceContent({ projectId, balance, targetSize, checkedAt }: { projectId: string; balance: Balance; targetSize: number; checkedAt: number }) {
  const online = useOnline();
  const role = useStoredSession()?.user.role;
  const checked = formatClock(new Date(checkedAt).toISOString());
  return (
    <>
      <div className="pl-board-head">
        <p className="pl-balance-total">
          <span className="pl-figure">{formatCount(balance.n)}</span> of <span className="pl-figure">{formatCount(targetSize)}</span>{' '}
          completes counted
        </p>
        <p className="pl-small pl-muted" role="status">
          {online ? `Updated ${checked}` : `Offline: as of ${checked}`}
        </p>
      </div>
      {balance.weightingProblem ? (
        <div className="pl-form-note pl-weighting-problem" role="note" aria-label="Weights not yet possible">
          <strong>No weights yet.</strong> {balance.weightingProblem}
        </div>
      ) : null}
      {balance.converged === false ? (
        <p className="pl-form-note">
          The weights did not settle within {balance.iterations} rounds of raking; treat the weighted figures as provisional.
        </p>
      ) : null}
      {balance.excluded > 0 ? (
        <p className="pl-small pl-muted">
          {formatCount(balance.excluded)} completes lack a category of a quota variable added later and are left out.
        </p>
      ) : null}

      <RetiredCategories projectId={projectId} balance={balance} editable={role === 'lead' || role === 'admin'} />

      <section className="pl-section" aria-labelledby="pl-headline-heading">
        <h2 id="pl-headline-heading" className="pl-section-title">Headline share</h2>
        <HeadlineShare balance={balance} />
      </section>

      <section className="pl-section" aria-labelledby="pl-precision-heading">
        <h2 id="pl-precision-heading" className="pl-section-title">What weighting costs</h2>
        <BalanceFigures balance={balance} />
        <InterviewerEffect balance={balance} />
      </section>

      <section className="pl-section" aria-labelledby="pl-mix-heading">
        <h2 id="pl-mix-heading" className="pl-section-title">Sample against targets</h2>
        {balance.margins.length === 0 ? (
          <EmptyPanel title="No quota targets yet">
            <p>The mix appears once the project has quota targets.</p>
          </EmptyPanel>
        ) : (
          <SampleMix margins={balance.margins} />
        )}
      </section>

      <BalanceCautions />
      <FiguresMethods />
    </>
  );
}
