import { Link, NavLink, Outlet, useNavigate, useParams } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/schemas/roles';
import { paths } from '@/config/paths';
import type { Me } from '@/features/auth/api/get-me';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-1.5 text-sm ${isActive ? 'bg-kraft-light font-medium text-kraft-dark' : 'text-ink hover:bg-kraft-light/60'}`;

/** The signed-in frame: brand, studio switcher, navigation and the person's menu. */
export function AppShell({ me, currentStudioId, onSignOut }: { me: Me; currentStudioId?: string; onSignOut: () => void }) {
  const navigate = useNavigate();
  const params = useParams();
  const studioId = currentStudioId ?? params.studioId ?? me.studios[0]?.id;
  const studio = me.studios.find((s) => s.id === studioId);
  return (
    <div className="min-h-screen">
      <header className="border-b border-line bg-white/80">
        <div className="mx-auto flex max-w-7xl items-center gap-4 px-6 py-3">
          <Link to={paths.home()} className="font-serif text-lg font-bold tracking-tight">
            Cardwright
          </Link>
          {me.studios.length > 0 && (
            <label className="flex items-center gap-2 text-sm text-pencil">
              <span className="sr-only">Studio</span>
              <select
                className="rounded-md border border-line bg-white px-2 py-1 text-sm text-ink"
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
          <nav className="flex items-center gap-1" aria-label="Main">
            {studioId && (
              <NavLink to={paths.studio(studioId)} end className={navClass}>
                Tutorials
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
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span className="text-pencil">{me.user.name}</span>
            <button type="button" className="rounded-md px-2 py-1 hover:bg-kraft-light" onClick={onSignOut}>
              Sign out
            </button>
          </div>
        </div>
      </header>
      <Outlet />
    </div>
  );
}
