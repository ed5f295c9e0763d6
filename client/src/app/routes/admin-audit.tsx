import { useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { AuditSearchScreen } from '@/features/audit/components/audit-search-screen';
import { usersQueryOptions } from '@/api/users/get-users';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';
import { useCurrentUser } from '@/lib/auth/use-session';

export function Component() {
  usePageTitle('Audit trail');
  const user = useCurrentUser();
  const admin = user.role === 'admin';
  // Only the admin may list users; a pharmacist's search has no person filter.
  const users = useQuery({ ...usersQueryOptions(), enabled: admin });
  const wards = useWards();
  const userOptions = useMemo(
    () =>
      admin
        ? (users.data ?? []).map((person) => ({ value: String(person.id), label: `${person.displayName} (${person.username})` }))
        : null,
    [admin, users.data],
  );
  const wardNames = useMemo(() => new Map((wards.data ?? []).map((ward) => [String(ward.id), ward.name])), [wards.data]);
  return <AuditSearchScreen users={userOptions} usersLoading={admin && users.isPending} wardNames={wardNames} />;
}
