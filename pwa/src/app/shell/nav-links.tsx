import { IonIcon } from '@ionic/react';
import { matchPath, NavLink, useLocation } from 'react-router-dom';
import type { NavItem } from '../role-navigation';

interface NavLinksProps {
  items: NavItem[];
  variant: 'side' | 'bottom';
}

/** The role's sections, as a bar along the bottom on phones or a column at the side. */
export function NavLinks({ items, variant }: NavLinksProps) {
  const { pathname } = useLocation();
  // A section stays marked on its own sub-pages (e.g. one project under Projects).
  const onSubPage = (item: NavItem) => (item.subPages ?? []).some((sub) => matchPath(sub.path, pathname) !== null);
  return (
    <nav className={`pl-nav pl-nav-${variant}`} aria-label="Sections">
      <ul>
        {items.map((item, index) => (
          <li key={item.path}>
            <NavLink
              to={item.path}
              end={index === 0}
              className={({ isActive }) => `pl-nav-link${isActive || onSubPage(item) ? ' active' : ''}`}
            >
              <IonIcon icon={item.icon} aria-hidden="true" />
              <span className="pl-nav-label">{item.label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
