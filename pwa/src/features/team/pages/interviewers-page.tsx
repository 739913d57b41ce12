import { PlannedPage } from '../../../components/planned-page';

export function InterviewersPage() {
  return (
    <PlannedPage title="Interviewers">
      <p>How each interviewer in your teams is doing: interviews logged, outcomes and flags, so you can move effort to the cells that are short.</p>
    </PlannedPage>
  );
}
