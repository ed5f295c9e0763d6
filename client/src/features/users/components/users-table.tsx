import { useMemo, useState } from 'react';
import { Button, EmptyState, Group, Text } from '@mantine/core';
import { IconUsers } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { ROLE_LABELS, type User, type Ward } from '@lockstep/shared';
import { DataTable } from '@/components/ui/data-table';
import { UserStatusBadge } from './user-status-badge';

export interface UsersTableProps {
  users: User[];
  totalCount: number;
  wards: Ward[];
  isLoading: boolean;
  currentUserId: number;
  onEdit: (user: User) => void;
  onSetActive: (user: User) => void;
}

const column = createColumnHelper<User>();

const usernameCellId = (user: User) => `user-${user.id}-username`;

export function UsersTable({ users, totalCount, wards, isLoading, currentUserId, onEdit, onSetActive }: UsersTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'username', desc: false }]);

  const columns = useMemo(() => {
    const wardNames = new Map(wards.map((ward) => [ward.id, ward.name]));
    const wardsOf = (user: User) =>
      user.wardIds
        .map((id) => wardNames.get(id) ?? `Ward ${id}`)
        .sort((a, b) => a.localeCompare(b))
        .join(', ');
    return [
      column.accessor('username', {
        header: 'Username',
        cell: ({ row, getValue }) => <span id={usernameCellId(row.original)}>{getValue()}</span>,
      }),
      column.accessor('displayName', { header: 'Display name' }),
      column.accessor((user) => ROLE_LABELS[user.role], { id: 'role', header: 'Role' }),
      column.accessor(wardsOf, {
        id: 'wards',
        header: 'Wards',
        cell: ({ getValue }) =>
          getValue() || (
            <Text span size="sm" c="dimmed">
              None
            </Text>
          ),
      }),
      column.accessor((user) => (user.active ? 'Active' : 'Inactive'), {
        id: 'status',
        header: 'Status',
        cell: ({ row }) => <UserStatusBadge active={row.original.active} />,
      }),
      column.display({
        id: 'actions',
        header: () => (
          <Text span size="sm" fw={600}>
            Actions
          </Text>
        ),
        cell: ({ row }) => {
          const user = row.original;
          const isSelf = user.id === currentUserId;
          return (
            <Group gap={6} wrap="nowrap">
              {/* Plain names ("Edit"), described by the row's username: the username in the
                  name would also become part of this cell's name and blur the table. */}
              <Button size="compact-sm" variant="default" onClick={() => onEdit(user)} aria-describedby={usernameCellId(user)}>
                Edit
              </Button>
              {/* An admin cannot lock themselves out from here. */}
              {isSelf ? null : (
                <Button
                  size="compact-sm"
                  variant="subtle"
                  color={user.active ? 'red' : undefined}
                  onClick={() => onSetActive(user)}
                  aria-describedby={usernameCellId(user)}
                >
                  {user.active ? 'Deactivate' : 'Reactivate'}
                </Button>
              )}
            </Group>
          );
        },
      }),
    ];
  }, [wards, currentUserId, onEdit, onSetActive]);

  const table = useReactTable({
    data: users,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (user) => String(user.id),
  });

  return (
    <DataTable
      table={table}
      label="Users"
      caption={isLoading ? undefined : `Showing ${users.length} of ${totalCount} users`}
      isLoading={isLoading}
      empty={
        <EmptyState size="sm" icon={<IconUsers aria-hidden />} title="No users to show" description="No user matches these filters." />
      }
    />
  );
}
