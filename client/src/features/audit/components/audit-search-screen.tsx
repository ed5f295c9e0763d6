import { useState } from 'react';
import { Group, Pagination, Paper, Stack, Text, Title } from '@mantine/core';
import { useNavigate, useSearchParams } from 'react-router-dom';
import type { AuditEvent } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useAuditEvents } from '@/api/audit/get-audit-events';
import { useVerifyAuditChain } from '@/api/audit/verify-audit-chain';
import {
  AUDIT_PAGE_SIZE,
  entityTypesFor,
  filtersFromSearch,
  pageCount,
  searchFromFilters,
  toAuditQuery,
  type AuditFilters,
} from '../utils/audit-filters';
import { AuditEventDrawer } from './audit-event-drawer';
import { AuditEventsTable } from './audit-events-table';
import { AuditFiltersForm, type UserOption } from './audit-filters-form';
import { VerifyChainButton, VerifyChainResult } from './verify-chain-panel';

export interface AuditSearchScreenProps {
  /** People for the person filter (admin); null leaves the filter out. */
  users: UserOption[] | null;
  usersLoading: boolean;
  wardNames: ReadonlyMap<string, string>;
}

const CONTROL_LABELS = { first: 'First page', previous: 'Previous page', next: 'Next page', last: 'Last page' } as const;

function rangeCaption(page: number, shown: number, total: number): string {
  if (total === 0) return 'No events';
  if (shown === 0) return `No events on page ${page} of these ${total}`;
  const first = (page - 1) * AUDIT_PAGE_SIZE + 1;
  return `Events ${first}–${first + shown - 1} of ${total}, newest first. Sorting a column reorders this page only.`;
}

/** The audit trail searched: admins see everything, pharmacists orders and library versions. */
export function AuditSearchScreen({ users, usersLoading, wardNames }: AuditSearchScreenProps) {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const search = searchParams.toString();
  const { filters, page } = filtersFromSearch(searchParams, user.role);
  const events = useAuditEvents(toAuditQuery(filters, page));
  const verify = useVerifyAuditChain();
  // The details stay open only for the search they were opened in.
  const [open, setOpen] = useState<{ search: string; event: AuditEvent } | null>(null);
  const openEvent = open?.search === search ? open.event : null;

  const go = (next: AuditFilters, nextPage = 1) => navigate(paths.adminAudit.getHref(searchFromFilters(next, nextPage)));
  const total = events.data?.total ?? 0;
  const rows = events.data?.events ?? [];
  const admin = user.role === 'admin';

  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-start">
        <div>
          <Title order={1}>Audit trail</Title>
          <Text size="sm" c="dimmed">
            {admin
              ? 'Every recorded action, newest first. Each event is chained to the one before by its hash.'
              : 'Recorded actions on orders and library versions, newest first.'}
          </Text>
        </div>
        {admin ? <VerifyChainButton verify={verify} /> : null}
      </Group>
      {admin ? <VerifyChainResult verify={verify} /> : null}

      <Paper withBorder radius="md" p="md">
        <AuditFiltersForm
          key={search}
          initial={filters}
          entityTypes={entityTypesFor(user.role)}
          users={users}
          usersLoading={usersLoading}
          onSearch={(next) => go(next)}
        />
      </Paper>

      {events.isError ? (
        <QueryErrorAlert title="The audit trail could not be loaded" error={events.error} onRetry={() => void events.refetch()} />
      ) : (
        <AuditEventsTable
          events={rows}
          role={user.role}
          wardNames={wardNames}
          isLoading={events.isPending}
          caption={events.isPending ? undefined : rangeCaption(page, rows.length, total)}
          openId={openEvent?.id ?? null}
          onOpen={(event) => setOpen({ search, event })}
        />
      )}

      {total > AUDIT_PAGE_SIZE ? (
        <Group justify="center" component="nav" aria-label="Audit trail pages">
          <Pagination
            total={pageCount(total)}
            value={Math.min(page, pageCount(total))}
            onChange={(next) => go(filters, next)}
            withEdges
            getItemProps={(item) => ({ 'aria-label': `Page ${item}` })}
            getControlProps={(control) => ({ 'aria-label': CONTROL_LABELS[control] })}
          />
        </Group>
      ) : null}

      <AuditEventDrawer event={openEvent} role={user.role} wardNames={wardNames} onClose={() => setOpen(null)} />
    </Stack>
  );
}
