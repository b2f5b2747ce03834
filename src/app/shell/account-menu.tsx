import { useEffect, useId, useRef } from 'react';
import { Link } from 'react-router';
import { ROLE_LABELS, type User } from '../../lib/user';
import { useMenuOpen } from './use-menu-open';
import { useSignOutAction } from './use-sign-out-action';

export function initialsOf(displayName: string): string {
  const words = displayName.trim().split(/\s+/).filter(Boolean);
  const letters = words.length > 1 ? [words[0][0], words[words.length - 1][0]] : [words[0]?.[0] ?? '?'];
  return letters.join('').toUpperCase();
}

export function Avatar({ user }: { user: User }) {
  return (
    <span aria-hidden="true" className="flex size-9 shrink-0 items-center justify-center rounded-pill bg-herb-700 text-sm font-black text-herb-50">
      {initialsOf(user.displayName)}
    </span>
  );
}

/** The signed-in person's button in the header, opening a small panel: account page and sign out. */
export function AccountMenu({ user }: { user: User }) {
  const [open, setOpen] = useMenuOpen();
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const { signOut, signingOut } = useSignOutAction();

  useEffect(() => {
    if (!open) return;
    const onPointer = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKey = (event: KeyboardEvent) => {
      if (event.key === 'Escape') {
        setOpen(false);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, [open, setOpen]);

  return (
    <div
      ref={rootRef}
      className="relative"
      onBlur={(event) => {
        // Tabbing out of the panel closes it.
        if (open && !rootRef.current?.contains(event.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
        className="flex items-center gap-2 rounded-pill py-1 pr-3 pl-1 font-bold text-ink hover:bg-oat-100"
      >
        <Avatar user={user} />
        <span className="max-w-40 truncate">{user.displayName}</span>
        <span className="sr-only">, account menu</span>
        <svg aria-hidden="true" viewBox="0 0 20 20" className={`size-4 transition-transform ${open ? 'rotate-180' : ''}`}>
          <path d="M5 7.5 10 12.5 15 7.5" stroke="currentColor" strokeWidth="2" fill="none" strokeLinecap="round" />
        </svg>
      </button>
      <div id={panelId} hidden={!open} className="absolute right-0 z-50 mt-2 w-72 rounded-card border border-line bg-surface p-2 shadow-pop">
        <div className="px-3 py-2">
          <p className="truncate font-bold text-ink">{user.displayName}</p>
          <p className="truncate text-sm text-ink-soft">{user.email}</p>
          <p className="mt-1 inline-block rounded-pill bg-herb-100 px-2.5 py-0.5 text-xs font-bold text-herb-800">{ROLE_LABELS[user.role]}</p>
        </div>
        <hr className="my-1 border-line" />
        <Link to="/account" className="block rounded-field px-3 py-2.5 font-semibold text-ink hover:bg-oat-100">
          Account and preferences
        </Link>
        <button
          type="button"
          onClick={signOut}
          disabled={signingOut}
          className="block w-full rounded-field px-3 py-2.5 text-left font-semibold text-ink hover:bg-oat-100 disabled:text-oat-600"
        >
          {signingOut ? 'Signing out…' : 'Sign out'}
        </button>
      </div>
    </div>
  );
}
