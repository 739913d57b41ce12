import { IonRouterOutlet } from '@ionic/react';
import { Suspense, type ReactElement } from 'react';
import { Navigate, Route } from 'react-router-dom';
import { HeaderSlotProvider } from '../../components/header-slot';
import { PlumblineLogo } from '../../components/plumbline-logo';
import { LoadingPanel } from '../../components/state-panels';
import type { SessionUser } from '../../db/plumbline-db';
import { useWideScreen } from '../../hooks/use-wide-screen';
import { AccountButton } from '../../features/auth/components/account-button';
import { AccountSummary } from '../../features/auth/components/account-summary';
import { homePathFor, roleNavigation } from '../role-navigation';
import { NavLinks } from './nav-links';

/** Pages that load on first use show a loading panel meanwhile. */
function loading(element: ReactElement): ReactElement {
  return <Suspense fallback={<LoadingPanel what="this page" />}>{element}</Suspense>;
}

/**
 * The signed-in frame. Only the person's own role's routes exist here, so any other path
 * (another role's area, /sign-in, an old link) lands on their home.
 */
export function RoleShell({ user }: { user: SessionUser }) {
  const wide = useWideScreen();
  const items = roleNavigation[user.role];

  return (
    <HeaderSlotProvider value={wide ? null : <AccountButton user={user} />}>
      <div className={`pl-shell ${wide ? 'is-wide' : 'is-narrow'}`}>
        {wide ? (
          <aside className="pl-side">
            <div className="pl-side-brand">
              <PlumblineLogo size={36} withName />
            </div>
            <NavLinks items={items} variant="side" />
            <AccountSummary user={user} />
          </aside>
        ) : null}
        <div className="pl-shell-main">
          <div className="pl-shell-outlet">
            <IonRouterOutlet>
              {items.map((item) => (
                <Route key={item.path} path={item.path} element={loading(item.element)} />
              ))}
              {items.flatMap((item) =>
                (item.subPages ?? []).map((sub) => <Route key={sub.path} path={sub.path} element={loading(sub.element)} />),
              )}
              <Route path="*" element={<Navigate to={homePathFor(user.role)} replace />} />
            </IonRouterOutlet>
          </div>
          {!wide && items.length > 1 ? <NavLinks items={items} variant="bottom" /> : null}
        </div>
      </div>
    </HeaderSlotProvider>
  );
}
