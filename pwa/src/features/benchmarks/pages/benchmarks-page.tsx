import { PlannedPage } from '../../../components/planned-page';

export function BenchmarksPage() {
  return (
    <PlannedPage title="Benchmarks">
      <p>Other polls on the same question by method group, and the reconciliation: the likely true share, each group's bias factor and each poll's chance-outlier probability.</p>
    </PlannedPage>
  );
}
