import { LogOut, Menu, X } from 'lucide-react';
import { useEffect, useId, useRef, useState } from 'react';
import { NavLink, Outlet, useLocation, useNavigate, useNavigation } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useMe } from '../../lib/api/me/get-me';
import { useLogout } from '../../lib/api/me/logout';
import { CAUTION } from '../../../shared/engine/types';
import { Loading } from '../ui/status';
import { Brand } from './brand';

function navClass({ isActive }: { isActive: boolean }): string {
  return `block rounded px-2.5 py-1.5 text-sm md:py-1 ${isActive ? 'bg-concrete-700 text-white' : 'text-concrete-100 hover:bg-concrete-700 hover:text-white'}`;
}

/**
 * The signed-in frame: navigation on a dark concrete bar, the person and sign out on the right.
 * Under the md breakpoint the links, the account and sign out fold into a menu behind one button
 * (Escape closes it and returns focus to the button), so nothing is pushed off a phone's screen.
 */
export function AppLayout() {
  const me = useMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const location = useLocation();
  // A route loader (the desk's) is reading the next page's data; the page shown stays until then.
  const loadingNext = useNavigation().state === 'loading';
  const user = me.data;
  const isAdmin = user?.role === 'admin';
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const button = useRef<HTMLButtonElement>(null);

  // A move to another page closes the menu.
  const [shownFor, setShownFor] = useState(location.pathname);
  if (shownFor !== location.pathname) {
    setShownFor(location.pathname);
    setOpen(false);
  }

  useEffect(() => {
    if (!open) return;
    function onKey(event: KeyboardEvent) {
      if (event.key !== 'Escape') return;
      setOpen(false);
      button.current?.focus();
    }
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [open]);

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2"
      >
        Skip to content
      </a>
      <header className="flex flex-wrap items-center gap-x-4 gap-y-2 bg-concrete-800 px-4 py-2 text-concrete-50">
        <Brand compact />
        <button
          ref={button}
          type="button"
          className="ml-auto inline-flex items-center gap-1 rounded px-2 py-1 text-sm text-concrete-100 hover:bg-concrete-700 hover:text-white md:hidden"
          aria-expanded={open}
          aria-controls={menuId}
          onClick={() => setOpen((o) => !o)}
        >
          {open ? <X size={16} aria-hidden="true" /> : <Menu size={16} aria-hidden="true" />} Menu
        </button>
        <div
          id={menuId}
          className={`${open ? 'flex' : 'hidden'} w-full flex-col gap-2 border-t border-concrete-700 pt-2 md:flex md:w-auto md:flex-1 md:flex-row md:items-center md:border-0 md:pt-0`}
        >
          <nav aria-label="Main">
            <ul className="flex flex-col gap-1 md:flex-row">
              <li>
                <NavLink to={paths.projects} className={navClass}>
                  Projects
                </NavLink>
              </li>
              <li>
                <NavLink to={paths.shapes} className={navClass}>
                  Shapes
                </NavLink>
              </li>
              {isAdmin ? (
                <li>
                  <NavLink to={paths.team} className={navClass}>
                    Team
                  </NavLink>
                </li>
              ) : null}
              {isAdmin ? (
                <li>
                  <NavLink to={paths.outbox} className={navClass}>
                    Outbox
                  </NavLink>
                </li>
              ) : null}
            </ul>
          </nav>
          <div className="flex flex-wrap items-center gap-3 text-sm md:ml-auto">
            {user ? (
              <NavLink
                to={paths.account}
                data-testid="who"
                title="Your account"
                className="rounded px-2.5 py-1 hover:underline md:px-0"
              >
                {user.displayName}{' '}
                <span className="rounded bg-concrete-700 px-1.5 py-0.5 text-xs text-concrete-100">
                  {user.role}
                </span>
              </NavLink>
            ) : null}
            <button
              type="button"
              className="inline-flex items-center gap-1 rounded px-2 py-1 text-concrete-100 hover:bg-concrete-700 hover:text-white"
              onClick={() =>
                logout.mutate(undefined, { onSettled: () => navigate(paths.signIn, { replace: true }) })
              }
            >
              <LogOut size={14} aria-hidden="true" /> Sign out
            </button>
          </div>
        </div>
      </header>
      <main id="main" className="min-w-0 flex-1">
        {loadingNext ? <Loading label="Opening…" /> : null}
        <Outlet />
      </main>
      {/* Every signed-in screen shows results or leads to them, so every one carries the caution:
          here, unless the view shows its own (a result view marks it data-caution). */}
      <footer
        className="border-t border-concrete-200 px-4 py-3 text-xs text-concrete-600 [main:has([data-caution])~&]:hidden"
        data-testid="caution-footer"
      >
        {CAUTION}
      </footer>
    </div>
  );
}
