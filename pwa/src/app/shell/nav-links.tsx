import { IonIcon } from '@ionic/react';
import { NavLink } from 'react-router-dom';
import type { NavItem } from '../role-navigation';

interface NavLinksProps {
  items: NavItem[];
  variant: 'side' | 'bottom';
}

/** The role's sections, as a bar along the bottom on phones or a column at the side. */
export function NavLinks({ items, variant }: NavLinksProps) {
  return (
    <nav className={`pl-nav pl-nav-${variant}`} aria-label="Sections">
      <ul>
        {items.map((item, index) => (
          <li key={item.path}>
            <NavLink to={item.path} end={index === 0} className="pl-nav-link">
              <IonIcon icon={item.icon} aria-hidden="true" />
              <span className="pl-nav-label">{item.label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
