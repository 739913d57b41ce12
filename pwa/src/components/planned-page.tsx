import type { ReactNode } from 'react';
import { PageFrame } from './page-frame';
import { EmptyPanel } from './state-panels';

interface PlannedPageProps {
  title: string;
  /** What this page will show once it is built, in the user's words. */
  children: ReactNode;
}

/** An honest page for work that is not built yet: it says what will be here and offers no controls. */
export function PlannedPage({ title, children }: PlannedPageProps) {
  return (
    <PageFrame title={title}>
      <EmptyPanel title="Coming in a later version">
        {children}
        <p className="pl-muted">Nothing is missing from your work: this page is not built yet and arrives in a coming update of Plumbline.</p>
      </EmptyPanel>
    </PageFrame>
  );
}
