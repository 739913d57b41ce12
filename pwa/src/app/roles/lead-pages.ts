// The project lead's pages, loaded as one chunk at sign-in; the heaviest (charts, the
// targets editor) load on first use on top of it.
export { ProjectsPage } from '../../features/projects/pages/projects-page';
export { NewProjectPage } from '../../features/projects/pages/new-project-page';
export { ProjectQuotaBoardPage } from '../../features/quotas/pages/project-quota-board-page';
export { ProjectInterviewersPage } from '../../features/team/pages/project-interviewers-page';
export { ProjectReviewQueuePage } from '../../features/review/pages/review-queue-page';
export { BenchmarksPage } from '../../features/benchmarks/pages/benchmarks-page';
export { DeliveryPage } from '../../features/delivery/pages/delivery-page';
