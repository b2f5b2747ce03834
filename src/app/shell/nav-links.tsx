import { NavLink } from 'react-router';
import { CountBadge, unreadCommentsLabel } from '../../components/ui/count-badge';
import { cx } from '../../lib/cx';
import type { NavItem } from '../access';

/** `unread`: unread comments from the coach, shown on the recipe book. */
export function NavLinks({ items, layout, unread = 0 }: { items: NavItem[]; layout: 'row' | 'column'; unread?: number }) {
  return (
    <ul className={cx('flex', layout === 'row' ? 'items-center gap-1' : 'flex-col gap-1')}>
      {items.map((item) => (
        <li key={item.to}>
          <NavLink
            to={item.to}
            end={item.to === '/'}
            className={({ isActive }) =>
              cx(
                'flex items-center gap-2 rounded-pill font-bold transition-colors',
                layout === 'row' ? 'px-3.5 py-2' : 'px-4 py-3 text-lg',
                isActive ? 'bg-ember-100 text-ember-800' : 'text-ink hover:bg-oat-100',
              )
            }
          >
            {item.label}
            {item.to === '/recipes' && <CountBadge count={unread} label={unreadCommentsLabel(unread)} />}
          </NavLink>
        </li>
      ))}
    </ul>
  );
}
