// The supervisor's pages, loaded as one chunk at sign-in.
export { QuotaBoardPage } from '../../features/quotas/pages/quota-board-page';
export { ReviewQueuePage } from '../../features/review/pages/review-queue-page';
export { InterviewersPage } from '../../features/team/pages/interviewers-page';
export { BackchecksPage } from '../../features/backchecks/pages/backchecks-page';
