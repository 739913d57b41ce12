import { lazy, type ReactElement } from 'react';
import {
  checkmarkDoneOutline,
  cloudUploadOutline,
  documentTextOutline,
  folderOpenOutline,
  gitCompareOutline,
  gridOutline,
  peopleOutline,
  pulseOutline,
  scaleOutline,
  statsChartOutline,
  sunnyOutline,
} from 'ionicons/icons';
import type { Role } from '../config/roles';
import { TodayPage } from '../features/fieldwork/pages/today-page';
import { CellsPage } from '../features/fieldwork/pages/cells-page';
import { OutboxPage } from '../features/outbox/pages/outbox-page';
import { QuotaBoardPage } from '../features/quotas/pages/quota-board-page';
import { ProjectQuotaBoardPage } from '../features/quotas/pages/project-quota-board-page';
import { ReviewQueuePage } from '../features/review/pages/review-queue-page';
import { InterviewersPage } from '../features/team/pages/interviewers-page';
import { ProjectsPage } from '../features/projects/pages/projects-page';
import { NewProjectPage } from '../features/projects/pages/new-project-page';
import { BenchmarksPage } from '../features/benchmarks/pages/benchmarks-page';
import { DeliveryPage } from '../features/delivery/pages/delivery-page';
import { PeoplePage } from '../features/people/pages/people-page';

// The heavier office pages (charts, the targets editor) load on first use, which keeps the
// bundle every interviewer's phone downloads small. The service worker still stores them
// for offline use.
const ProjectPage = lazy(() => import('../features/projects/pages/project-page').then((m) => ({ default: m.ProjectPage })));
const BalancePage = lazy(() => import('../features/balance/pages/balance-page').then((m) => ({ default: m.BalancePage })));
const ProgressPage = lazy(() => import('../features/balance/pages/progress-page').then((m) => ({ default: m.ProgressPage })));

export interface NavItem {
  path: string;
  label: string;
  icon: string;
  element: ReactElement;
  /** Pages reached from this section (e.g. one project), not listed in the navigation. */
  subPages?: { path: string; element: ReactElement }[];
}

/** Each role's own area: its home is the first item. A path outside it sends the person home. */
export const roleNavigation: Record<Role, NavItem[]> = {
  interviewer: [
    { path: '/interviewer', label: 'Today', icon: sunnyOutline, element: <TodayPage /> },
    { path: '/interviewer/outbox', label: 'Outbox', icon: cloudUploadOutline, element: <OutboxPage /> },
    { path: '/interviewer/cells', label: 'Cells', icon: gridOutline, element: <CellsPage /> },
  ],
  supervisor: [
    { path: '/supervisor', label: 'Quota board', icon: statsChartOutline, element: <QuotaBoardPage /> },
    { path: '/supervisor/review', label: 'Review queue', icon: checkmarkDoneOutline, element: <ReviewQueuePage /> },
    { path: '/supervisor/interviewers', label: 'Interviewers', icon: peopleOutline, element: <InterviewersPage /> },
  ],
  lead: [
    {
      path: '/lead',
      label: 'Projects',
      icon: folderOpenOutline,
      element: <ProjectsPage />,
      subPages: [
        { path: '/lead/projects/new', element: <NewProjectPage /> },
        { path: '/lead/projects/:projectId', element: <ProjectPage /> },
        { path: '/lead/projects/:projectId/quota-board', element: <ProjectQuotaBoardPage /> },
      ],
    },
    { path: '/lead/balance', label: 'Balance', icon: scaleOutline, element: <BalancePage /> },
    { path: '/lead/benchmarks', label: 'Benchmarks', icon: gitCompareOutline, element: <BenchmarksPage /> },
    { path: '/lead/delivery', label: 'Delivery', icon: documentTextOutline, element: <DeliveryPage /> },
  ],
  client: [{ path: '/client', label: 'Progress', icon: pulseOutline, element: <ProgressPage /> }],
  admin: [{ path: '/admin', label: 'People', icon: peopleOutline, element: <PeoplePage /> }],
};

export function homePathFor(role: Role): string {
  return roleNavigation[role][0]!.path;
}
