import { PlannedPage } from '../../../components/planned-page';

export function ReviewQueuePage() {
  return (
    <PlannedPage title="Review queue">
      <p>Interviews with a flag (too short, too many in an hour, identical answer patterns) waiting for you to approve or reject.</p>
    </PlannedPage>
  );
}
