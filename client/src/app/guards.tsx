import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { canAccess, homePathFor, type Area } from '@/config/navigation';
import { paths } from '@/config/paths';
import { getLastEndReason } from '@/lib/auth/session-store';
import { useCurrentUser, useSession } from '@/lib/auth/use-session';

/** Signed-in screens only: anyone else goes to sign-in, and comes back here afterwards. */
export function RequireSession() {
  const { user } = useSession();
  const location = useLocation();
  if (!user) {
    // After "Sign out", or an idle sign-out on a shared computer (most likely someone else signs
    // in next), the next person starts from their own home, not the last patient's screen.
    const reason = getLastEndReason();
    const comeBackTo = reason === 'signed-out' || reason === 'idle' ? undefined : `${location.pathname}${location.search}`;
    return <Navigate to={paths.signIn.getHref(comeBackTo)} replace />;
  }
  return <Outlet />;
}

/** Screens of one area: a role from another area is sent to its own home. */
export function RequireArea({ area }: { area: Area }) {
  const user = useCurrentUser();
  if (!canAccess(user.role, area)) return <Navigate to={homePathFor(user.role)} replace />;
  return <Outlet />;
}

export function RedirectHome() {
  const user = useCurrentUser();
  return <Navigate to={homePathFor(user.role)} replace />;
}
