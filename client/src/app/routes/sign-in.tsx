import { Navigate, useSearchParams } from 'react-router-dom';
import { IDLE_SIGN_OUT_MINUTES } from '@/config/env';
import { landingPathFor } from '@/config/navigation';
import { SignInScreen } from '@/features/auth/components/sign-in-screen';
import { formatIdleDuration } from '@/features/auth/utils/idle-timer';
import { getLastEndReason, type SessionEndReason } from '@/lib/auth/session-store';
import { useSession } from '@/lib/auth/use-session';

function endNotice(reason: SessionEndReason | null): string | undefined {
  if (reason === 'expired') return 'Your session has ended. Sign in again to carry on.';
  if (reason === 'idle')
    return `Signed out after ${formatIdleDuration(IDLE_SIGN_OUT_MINUTES * 60_000)} without activity. Sign in again to carry on.`;
  return undefined;
}

export function Component() {
  const { user, signIn } = useSession();
  const [searchParams] = useSearchParams();

  // Signing in updates the session, and this redirect takes the person on from here.
  if (user) return <Navigate to={landingPathFor(user.role, searchParams.get('redirectTo'))} replace />;

  const notice = endNotice(getLastEndReason());
  return <SignInScreen onSignedIn={signIn} notice={notice} />;
}
