import { PageFrame } from '../../../components/page-frame';
import { ProjectBalance } from '../components/project-balance';

/** The lead's balance: how far the sample has drifted from the targets, and what it costs. */
export function BalancePage() {
  return (
    <PageFrame
      title="Balance"
      lead="How far the completed interviews have drifted from the population targets, what weighting back costs in precision, and how much the drift pulls the headline share."
    >
      <ProjectBalance emptyNote="Set up a project first; its balance appears here once interviews come in." />
    </PageFrame>
  );
}
