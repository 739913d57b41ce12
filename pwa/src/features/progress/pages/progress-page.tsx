import { PlannedPage } from '../../../components/planned-page';

export function ProgressPage() {
  return (
    <PlannedPage title="Progress">
      <p>Read-only progress and balance of the projects your agency shares with you.</p>
    </PlannedPage>
  );
}
