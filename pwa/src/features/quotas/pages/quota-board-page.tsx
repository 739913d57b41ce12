import { PlannedPage } from '../../../components/planned-page';

export function QuotaBoardPage() {
  return (
    <PlannedPage title="Quota board">
      <p>Each cell of your projects with its target, achieved, remaining and fill rate, and whether it is open, nearly full, full, closed or over quota.</p>
    </PlannedPage>
  );
}
