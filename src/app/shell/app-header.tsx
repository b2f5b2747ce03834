import { useEffect, useId, useRef } from 'react';
import { Link } from 'react-router';
import { buttonClasses } from '../../components/ui/button';
import { ToastRegion } from '../../components/ui/toast';
import { CountBadge, unreadCommentsLabel } from '../../components/ui/count-badge';
import { useUnreadCommentTotal } from './use-unread-comments';
import { ROLE_LABELS } from '../../lib/user';
import { navItemsFor } from '../access';
import { useAuth } from '../auth-context';
import { AccountMenu, Avatar } from './account-menu';
import { BrandMark } from './brand-mark';
import { NavLinks } from './nav-links';
import { useMenuOpen } from './use-menu-open';
import { useSignOutAction } from './use-sign-out-action';

function Wordmark() {
  return (
    <Link to="/" className="flex shrink-0 items-center gap-2 rounded-field">
      <BrandMark className="size-9" />
      <span className="text-2xl font-black tracking-tight text-ink">
        Hearth<span className="text-accent">swap</span>
      </span>
    </Link>
  );
}

function SignedOutLinks({ layout }: { layout: 'row' | 'column' }) {
  const size = layout === 'row' ? 'md' : 'lg';
  return (
    <div className={layout === 'row' ? 'flex items-center gap-2' : 'flex flex-col gap-2'}>
      <Link to="/sign-in" className={buttonClasses({ variant: 'quiet', size, fullWidth: layout === 'column' })}>
        Sign in
      </Link>
      <Link to="/sign-up" className={buttonClasses({ variant: 'primary', size, fullWidth: layout === 'column' })}>
        Create account
      </Link>
    </div>
  );
}

function MobileAccount() {
  const { user } = useAuth();
  const { signOut, signingOut } = useSignOutAction();
  if (!user) return <SignedOutLinks layout="column" />;
  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-center gap-3 px-2 py-1">
        <Avatar user={user} />
        <div className="min-w-0">
          <p className="truncate font-bold">{user.displayName}</p>
          <p className="truncate text-sm text-ink-soft">
            {ROLE_LABELS[user.role]} · {user.email}
          </p>
        </div>
      </div>
      <Link to="/account" className={buttonClasses({ variant: 'secondary', size: 'lg', fullWidth: true })}>
        Account and preferences
      </Link>
      <button type="button" onClick={signOut} disabled={signingOut} className={buttonClasses({ variant: 'quiet', size: 'lg', fullWidth: true })}>
        {signingOut ? 'Signing out…' : 'Sign out'}
      </button>
    </div>
  );
}

export function AppHeader() {
  const auth = useAuth();
  const items = navItemsFor(auth.user);
  const [menuOpen, setMenuOpen] = useMenuOpen();
  const menuId = useId();
  const menuButton = useRef<HTMLButtonElement>(null);
  const unread = useUnreadCommentTotal();

  useEffect(() => {
    if (!menuOpen) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setMenuOpen(false);
        menuButton.current?.focus();
      }
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [menuOpen, setMenuOpen]);

  return (
    <header className="sticky top-0 z-40 border-b border-line bg-canvas/95 backdrop-blur-sm">
      <div className="mx-auto flex max-w-shell items-center gap-6 px-gutter py-3">
        <Wordmark />
        <nav aria-label="Main" className="hidden lg:block">
          <NavLinks items={items} layout="row" unread={unread} />
        </nav>
        <div className="ml-auto hidden lg:block">
          {auth.status === 'signed-in' && auth.user ? (
            <AccountMenu user={auth.user} />
          ) : auth.status === 'checking' ? (
            <span className="block h-10 w-40 animate-pulse rounded-pill bg-oat-200" aria-hidden="true" />
          ) : (
            <SignedOutLinks layout="row" />
          )}
        </div>
        <button
          ref={menuButton}
          type="button"
          aria-expanded={menuOpen}
          aria-controls={menuId}
          onClick={() => setMenuOpen((v) => !v)}
          className={buttonClasses({ variant: 'secondary', size: 'md', className: 'ml-auto lg:hidden' })}
        >
          <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5">
            {menuOpen ? (
              <path d="M5 5l10 10M15 5 5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            ) : (
              <path d="M3 6h14M3 10h14M3 14h14" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            )}
          </svg>
          {menuOpen ? 'Close' : 'Menu'}
          {!menuOpen && <CountBadge count={unread} label={unreadCommentsLabel(unread)} />}
        </button>
      </div>
      <ToastRegion />
      <div id={menuId} hidden={!menuOpen} className="border-t border-line bg-canvas lg:hidden">
        <div className="mx-auto flex max-w-shell flex-col gap-5 px-gutter py-4">
          <nav aria-label="Main">
            <NavLinks items={items} layout="column" unread={unread} />
          </nav>
          <hr className="border-line" />
          {auth.status === 'checking' ? null : <MobileAccount />}
        </div>
      </div>
    </header>
  );
}
