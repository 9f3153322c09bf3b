import { LogOut } from 'lucide-react';
import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useMe } from '../../lib/api/me/get-me';
import { useLogout } from '../../lib/api/me/logout';
import { CAUTION } from '../../../shared/engine/types';
import { Brand } from './brand';

function navClass({ isActive }: { isActive: boolean }): string {
  return `rounded px-2.5 py-1 text-sm ${isActive ? 'bg-concrete-700 text-white' : 'text-concrete-200 hover:bg-concrete-700 hover:text-white'}`;
}

/** The signed-in frame: navigation on a dark concrete bar, the person and sign out on the right. */
export function AppLayout() {
  const me = useMe();
  const logout = useLogout();
  const navigate = useNavigate();
  const user = me.data;
  const isAdmin = user?.role === 'admin';
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2"
      >
        Skip to content
      </a>
      <header className="flex items-center gap-4 bg-concrete-800 px-4 py-2 text-concrete-50">
        <Brand compact />
        <nav aria-label="Main" className="flex gap-1">
          <NavLink to={paths.projects} className={navClass}>
            Projects
          </NavLink>
          <NavLink to={paths.shapes} className={navClass}>
            Shapes
          </NavLink>
          {isAdmin ? (
            <NavLink to={paths.team} className={navClass}>
              Team
            </NavLink>
          ) : null}
          {isAdmin ? (
            <NavLink to={paths.outbox} className={navClass}>
              Outbox
            </NavLink>
          ) : null}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          {user ? (
            <NavLink to={paths.account} data-testid="who" title="Your account" className="hover:underline">
              {user.displayName}{' '}
              <span className="rounded bg-concrete-700 px-1.5 py-0.5 text-xs text-concrete-200">
                {user.role}
              </span>
            </NavLink>
          ) : null}
          <button
            type="button"
            className="inline-flex items-center gap-1 rounded px-2 py-1 text-concrete-200 hover:bg-concrete-700 hover:text-white"
            onClick={() =>
              logout.mutate(undefined, { onSettled: () => navigate(paths.signIn, { replace: true }) })
            }
          >
            <LogOut size={14} aria-hidden="true" /> Sign out
          </button>
        </div>
      </header>
      <main id="main" className="flex-1">
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
