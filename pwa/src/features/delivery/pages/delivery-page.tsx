import { PlannedPage } from '../../../components/planned-page';

export function DeliveryPage() {
  return (
    <PlannedPage title="Delivery">
      <p>The weighted data export, one row per interview with its weight, and the methods statement for publication.</p>
    </PlannedPage>
  );
}
