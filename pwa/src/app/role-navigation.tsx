import { lazy, type ComponentType, type ReactElement } from 'react';
import {
  callOutline,
  checkmarkDoneOutline,
  cloudUploadOutline,
  documentTextOutline,
  folderOpenOutline,
  gitCompareOutline,
  gridOutline,
  peopleOutline,
  pulseOutline,
  trendingUpOutline,
  scaleOutline,
  statsChartOutline,
  sunnyOutline,
} from 'ionicons/icons';
import type { Role } from '../config/roles';
import { heading, WORDS } from '../lib/glossary';

// Each role's pages come in their own chunk, loaded when that role signs in, so a phone
// never downloads another role's code; the heavier office pages (charts, the targets
// editor) load on first use. The service worker keeps what was loaded for offline use.
type PageModule = Record<string, ComponentType>;
function page<M extends PageModule>(load: () => Promise<M>, name: keyof M & string) {
  return lazy(() => load().then((module) => ({ default: module[name]! })));
}
const interviewerPages = () => import('./roles/interviewer-pages');
const supervisorPages = () => import('./roles/supervisor-pages');
const leadPages = () => import('./roles/lead-pages');
const adminPages = () => import('./roles/admin-pages');

const TodayPage = page(interviewerPages, 'TodayPage');
const OutboxPage = page(interviewerPages, 'OutboxPage');
const CellsPage = page(interviewerPages, 'CellsPage');
const QuotaBoardPage = page(supervisorPages, 'QuotaBoardPage');
const ReviewQueuePage = page(supervisorPages, 'ReviewQueuePage');
const InterviewersPage = page(supervisorPages, 'InterviewersPage');
const BackchecksPage = page(supervisorPages, 'BackchecksPage');
const ProjectsPage = page(leadPages, 'ProjectsPage');
const NewProjectPage = page(leadPages, 'NewProjectPage');
const ProjectQuotaBoardPage = page(leadPages, 'ProjectQuotaBoardPage');
const ProjectInterviewersPage = page(leadPages, 'ProjectInterviewersPage');
const ProjectReviewQueuePage = page(leadPages, 'ProjectReviewQueuePage');
const BenchmarksPage = page(leadPages, 'BenchmarksPage');
const DeliveryPage = page(leadPages, 'DeliveryPage');
const PeoplePage = page(adminPages, 'PeoplePage');
const ProjectPage = page(() => import('../features/projects/pages/project-page'), 'ProjectPage');
const BalancePage = page(() => import('../features/balance/pages/balance-page'), 'BalancePage');
const ProgressPage = page(() => import('../features/balance/pages/progress-page'), 'ProgressPage');
const ProjectProjectionPage = page(() => import('../features/projection/pages/project-projection-page'), 'ProjectProjectionPage');
const ClientProjectionPage = page(() => import('../features/projection/pages/client-projection-page'), 'ClientProjectionPage');
const ReconciliationPage = page(() => import('../features/benchmarks/pages/reconciliation-page'), 'ReconciliationPage');

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
    { path: '/interviewer/outbox', label: heading(WORDS.outbox.one), icon: cloudUploadOutline, element: <OutboxPage /> },
    { path: '/interviewer/cells', label: 'Cells', icon: gridOutline, element: <CellsPage /> },
  ],
  supervisor: [
    { path: '/supervisor', label: 'Quota board', icon: statsChartOutline, element: <QuotaBoardPage /> },
    { path: '/supervisor/review', label: 'Review queue', icon: checkmarkDoneOutline, element: <ReviewQueuePage /> },
    { path: '/supervisor/interviewers', label: 'Interviewers', icon: peopleOutline, element: <InterviewersPage /> },
    { path: '/supervisor/backchecks', label: 'Back-checks', icon: callOutline, element: <BackchecksPage /> },
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
        { path: '/lead/projects/:projectId/interviewers', element: <ProjectInterviewersPage /> },
        { path: '/lead/projects/:projectId/review', element: <ProjectReviewQueuePage /> },
        { path: '/lead/projects/:projectId/projection', element: <ProjectProjectionPage /> },
      ],
    },
    { path: '/lead/balance', label: 'Balance', icon: scaleOutline, element: <BalancePage /> },
    { path: '/lead/benchmarks', label: 'Benchmarks', icon: gitCompareOutline, element: <BenchmarksPage /> },
    { path: '/lead/delivery', label: 'Delivery', icon: documentTextOutline, element: <DeliveryPage /> },
  ],
  client: [
    { path: '/client', label: 'Progress', icon: pulseOutline, element: <ProgressPage /> },
    { path: '/client/projection', label: 'Projection', icon: trendingUpOutline, element: <ClientProjectionPage /> },
    { path: '/client/other-polls', label: 'Other polls', icon: gitCompareOutline, element: <ReconciliationPage /> },
  ],
  admin: [{ path: '/admin', label: 'People', icon: peopleOutline, element: <PeoplePage /> }],
};

export function homePathFor(role: Role): string {
  return roleNavigation[role][0]!.path;
}
