import { Navigate, useSearchParams } from 'react-router-dom';
import { landingPathFor } from '@/config/navigation';
import { SignInScreen } from '@/features/auth/components/sign-in-screen';
import { getLastEndReason } from '@/lib/auth/session-store';
import { useSession } from '@/lib/auth/use-session';

export function Component() {
  const { user, signIn } = useSession();
  const [searchParams] = useSearchParams();

  // Signing in updates the session, and this redirect takes the person on from here.
  if (user) return <Navigate to={landingPathFor(user.role, searchParams.get('redirectTo'))} replace />;

  const notice = getLastEndReason() === 'expired' ? 'Your session has ended. Sign in again to carry on.' : undefined;
  return <SignInScreen onSignedIn={signIn} notice={notice} />;
}
