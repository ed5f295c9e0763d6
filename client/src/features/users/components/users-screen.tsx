import { useCallback, useMemo, useState } from 'react';
import { Button, Group, Select, Stack, TextInput, Title } from '@mantine/core';
import { IconPlus, IconSearch } from '@tabler/icons-react';
import type { Role, User, Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useUsers } from '@/api/users/get-users';
import { filterUsers } from '../utils/filter-users';
import { CreateUserModal } from './create-user-modal';
import { EditUserModal } from './edit-user-modal';
import { isRole, ROLE_OPTIONS } from './role-select';
import { SetActiveModal } from './set-active-modal';
import { UsersTable } from './users-table';

const ALL_ROLES = 'all';

type OpenModal = { kind: 'create' } | { kind: 'edit'; user: User } | { kind: 'set-active'; user: User } | null;

export interface UsersScreenProps {
  wards: Ward[];
  wardsLoading: boolean;
}

export function UsersScreen({ wards, wardsLoading }: UsersScreenProps) {
  const currentUser = useCurrentUser();
  const usersQuery = useUsers();
  const [role, setRole] = useState<Role | null>(null);
  const [search, setSearch] = useState('');
  const [modal, setModal] = useState<OpenModal>(null);

  const allUsers = useMemo(() => usersQuery.data ?? [], [usersQuery.data]);
  const shown = useMemo(() => filterUsers(allUsers, { role, search }), [allUsers, role, search]);
  const closeModal = useCallback(() => setModal(null), []);
  const openEdit = useCallback((user: User) => setModal({ kind: 'edit', user }), []);
  const openSetActive = useCallback((user: User) => setModal({ kind: 'set-active', user }), []);

  return (
    <Stack gap="md">
      <Group justify="space-between" align="center">
        <Title order={1}>Users</Title>
        <Button leftSection={<IconPlus size={16} aria-hidden />} onClick={() => setModal({ kind: 'create' })}>
          New user
        </Button>
      </Group>

      <Group gap="sm" align="flex-end" wrap="wrap">
        <Select
          label="Role"
          data={[{ value: ALL_ROLES, label: 'All roles' }, ...ROLE_OPTIONS]}
          value={role ?? ALL_ROLES}
          onChange={(value) => setRole(isRole(value) ? value : null)}
          allowDeselect={false}
          w={200}
        />
        <TextInput
          label="Search"
          placeholder="Username or name"
          value={search}
          onChange={(event) => setSearch(event.currentTarget.value)}
          leftSection={<IconSearch size={16} aria-hidden />}
          w={280}
        />
      </Group>

      {usersQuery.isError ? (
        <QueryErrorAlert title="Users could not be loaded" error={usersQuery.error} onRetry={() => void usersQuery.refetch()} />
      ) : (
        <UsersTable
          users={shown}
          totalCount={allUsers.length}
          wards={wards}
          // Wait for ward names too, rather than flash ward numbers.
          isLoading={usersQuery.isPending || wardsLoading}
          currentUserId={currentUser.id}
          onEdit={openEdit}
          onSetActive={openSetActive}
        />
      )}

      <CreateUserModal opened={modal?.kind === 'create'} onClose={closeModal} wards={wards} />
      {modal?.kind === 'edit' ? <EditUserModal user={modal.user} wards={wards} onClose={closeModal} /> : null}
      {modal?.kind === 'set-active' ? <SetActiveModal user={modal.user} onClose={closeModal} /> : null}
    </Stack>
  );
}
