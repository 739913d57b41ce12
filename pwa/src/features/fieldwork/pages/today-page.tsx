import { PlannedPage } from '../../../components/planned-page';

export function TodayPage() {
  return (
    <PlannedPage title="Today">
      <p>Your projects for today and the cells still open for you, from the last sync, with the way to log each contact and its outcome, online or not.</p>
    </PlannedPage>
  );
}
