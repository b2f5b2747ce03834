import { useCallback, useState, type SetStateAction } from 'react';
import { useLocation } from 'react-router';

/**
 * Open/closed state for a header menu that closes itself on navigation: the menu is open only on the
 * path it was opened on, so no effect has to reset it after the route changes.
 */
export function useMenuOpen(): [boolean, (next: SetStateAction<boolean>) => void] {
  const { pathname } = useLocation();
  const [openOn, setOpenOn] = useState<string | null>(null);
  const setOpen = useCallback(
    (next: SetStateAction<boolean>) =>
      setOpenOn((on) => {
        const value = typeof next === 'function' ? next(on === pathname) : next;
        return value ? pathname : null;
      }),
    [pathname],
  );
  return [openOn === pathname, setOpen];
}
