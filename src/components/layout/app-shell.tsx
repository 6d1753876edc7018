import { useEffect, useState } from 'react';
import { Link, NavLink, Outlet, useLocation, useNavigate, useParams } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/schemas/roles';
import { paths } from '@/config/paths';
import type { MeDto as Me } from '@shared/schemas/auth';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `block rounded-md px-3 py-2 text-sm lg:py-1.5 ${isActive ? 'bg-kraft-light font-medium text-kraft-dark' : 'text-ink hover:bg-kraft-light/60'}`;

/**
 * The signed-in frame: brand, studio switcher, navigation and the person's menu. Below the
 * large breakpoint (phones and tablets) everything but the brand folds into one "Menu" button;
 * the same elements are laid out in a row on wider screens, so there is one set of links.
 */
export function AppShell({ me, currentStudioId, onSignOut }: { me: Me; currentStudioId?: string; onSignOut: () => void }) {
  const navigate = useNavigate();
  const params = useParams();
  const location = useLocation();
  const [open, setOpen] = useState(false);
  const studioId = currentStudioId ?? params.studioId ?? me.studios[0]?.id;
  const studio = me.studios.find((s) => s.id === studioId);
  // A followed link closes the menu.
  useEffect(() => setOpen(false), [location.pathname]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpen(false);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [open]);
  return (
    <div className="min-h-screen">
      <header className="border-b border-line bg-white/80">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3 sm:px-6">
          <Link to={paths.home()} className="font-serif text-lg font-bold tracking-tight">
            Cardwright
          </Link>
          {studio && <span className="min-w-0 flex-1 truncate text-sm text-pencil lg:hidden">{studio.name}</span>}
          <button
            type="button"
            className="ml-auto inline-flex items-center gap-2 rounded-md border border-field bg-white px-3 py-1.5 text-sm lg:hidden"
            aria-expanded={open}
            aria-controls="main-menu"
            onClick={() => setOpen((o) => !o)}
          >
            <svg viewBox="0 0 16 16" className="h-4 w-4" aria-hidden>
              {open ? (
                <path d="M3.5 3.5l9 9m0-9l-9 9" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
              ) : (
                <path d="M2.5 4h11M2.5 8h11M2.5 12h11" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
              )}
            </svg>
            Menu
          </button>
          <div
            id="main-menu"
            className={`${open ? 'flex' : 'hidden'} w-full flex-col gap-3 border-t border-line pt-3 lg:flex lg:w-auto lg:flex-1 lg:flex-row lg:items-center lg:gap-4 lg:border-0 lg:pt-0`}
          >
            {me.studios.length > 0 && (
              <label className="flex items-center gap-2 text-sm text-pencil">
                <span className="lg:sr-only">Studio</span>
                <select
                  className="min-w-0 flex-1 rounded-md border border-field bg-white px-2 py-1 text-sm text-ink lg:flex-none"
                  value={studioId}
                  onChange={(e) => navigate(paths.studio(e.target.value))}
                >
                  {me.studios.map((s) => (
                    <option key={s.id} value={s.id}>
                      {s.name}
                    </option>
                  ))}
                </select>
                {studio && <span className="text-xs">{ROLE_LABELS[studio.role]}</span>}
              </label>
            )}
            <nav className="flex flex-col gap-1 lg:flex-row lg:items-center" aria-label="Main">
              {studioId && (
                <NavLink to={paths.studio(studioId)} end className={navClass}>
                  Tutorials
                </NavLink>
              )}
              {studioId && studio?.abilities.readBoard && (
                <NavLink to={paths.board(studioId)} className={navClass}>
                  Board
                </NavLink>
              )}
              {studioId && studio?.abilities.readBoard && (
                <NavLink to={paths.briefs(studioId)} className={navClass}>
                  Briefs
                </NavLink>
              )}
              {studioId && studio?.abilities.listClasses && (
                <NavLink to={paths.classes(studioId)} className={navClass}>
                  Classes
                </NavLink>
              )}
              {studioId && (
                <NavLink to={paths.members(studioId)} className={navClass}>
                  Members
                </NavLink>
              )}
              {me.outbox && (
                <NavLink to={paths.outbox()} className={navClass}>
                  Outbox
                </NavLink>
              )}
            </nav>
            <div className="flex items-center justify-between gap-3 text-sm lg:ml-auto lg:justify-start">
              <span className="text-pencil">{me.user.name}</span>
              <NavLink to={paths.account()} className={navClass}>
                Account
              </NavLink>
              {studioId && (
                <NavLink to={paths.mailSettings(studioId)} className={navClass}>
                  E-mail settings
                </NavLink>
              )}
              <button type="button" className="rounded-md border border-field px-3 py-1.5 hover:bg-kraft-light lg:border-0 lg:px-2 lg:py-1" onClick={onSignOut}>
                Sign out
              </button>
            </div>
          </div>
        </div>
      </header>
      <Outlet />
    </div>
  );
}
