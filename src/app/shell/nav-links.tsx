import { NavLink } from 'react-router';
import { cx } from '../../lib/cx';
import type { NavItem } from '../access';

export function NavLinks({ items, layout }: { items: NavItem[]; layout: 'row' | 'column' }) {
  return (
    <ul className={cx('flex', layout === 'row' ? 'items-center gap-1' : 'flex-col gap-1')}>
      {items.map((item) => (
        <li key={item.to}>
          <NavLink
            to={item.to}
            end={item.to === '/'}
            className={({ isActive }) =>
              cx(
                'block rounded-pill font-bold transition-colors',
                layout === 'row' ? 'px-3.5 py-2' : 'px-4 py-3 text-lg',
                isActive ? 'bg-ember-100 text-ember-800' : 'text-ink hover:bg-oat-100',
              )
            }
          >
            {item.label}
          </NavLink>
        </li>
      ))}
    </ul>
  );
}
