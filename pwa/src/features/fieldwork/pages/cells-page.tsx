import { PlannedPage } from '../../../components/planned-page';

export function CellsPage() {
  return (
    <PlannedPage title="Cells">
      <p>Every cell of your projects with its status (open, nearly full, full or closed), so you know before you start whether a respondent's cell is still open.</p>
    </PlannedPage>
  );
}
