// The interviewer's pages, loaded as one chunk at sign-in (and kept by the service worker),
// so a phone downloads only its own role's code.
export { TodayPage } from '../../features/fieldwork/pages/today-page';
export { CellsPage } from '../../features/fieldwork/pages/cells-page';
export { OutboxPage } from '../../features/outbox/pages/outbox-page';
