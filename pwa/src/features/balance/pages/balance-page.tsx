import { PlannedPage } from '../../../components/planned-page';

export function BalancePage() {
  return (
    <PlannedPage title="Balance">
      <p>For the interviews so far: the sample mix against the targets, design effect, effective sample size, margin of error, and the implied bias factor with its trend and its projection to the end of fieldwork.</p>
    </PlannedPage>
  );
}
