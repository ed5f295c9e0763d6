import { useEffect } from 'react';
import { Outlet } from 'react-router-dom';
import { AppShellLayout } from '@/components/layouts/app-shell-layout';
import { useMe } from '@/features/auth/api/get-me';
import { IdleSignOut } from '@/features/auth/components/idle-sign-out';
import { updateSessionUser } from '@/lib/auth/session-store';

export function Component() {
  // Confirms the stored token still works (a 401 ends the session) and picks up a changed
  // name or role without signing in again.
  const me = useMe();
  useEffect(() => {
    if (me.data) updateSessionUser(me.data);
  }, [me.data]);

  return (
    <AppShellLayout>
      <Outlet />
      <IdleSignOut />
    </AppShellLayout>
  );
}
