import { Anchor, Code, DataList, Drawer, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { auditActionLabel, type AuditEvent, type Role } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { actorText } from '@/components/audit/audit-actor';
import { entityHref, entityLabel, entitySearchHref, shortHash } from '../utils/audit-entity';
import { AuditSummaryList } from '@/components/audit/audit-summary-list';

export interface AuditEventDrawerProps {
  event: AuditEvent | null;
  role: Role;
  wardNames: ReadonlyMap<string, string>;
  onClose: () => void;
}

function Hash({ value }: { value: string }) {
  return <Code title={value}>{shortHash(value)}</Code>;
}

/** One event in full: who, when, what it recorded, and its place in the hash chain. */
export function AuditEventDrawer({ event, role, wardNames, onClose }: AuditEventDrawerProps) {
  return (
    <Drawer
      opened={event !== null}
      onClose={onClose}
      position="right"
      size="lg"
      title={event ? `Event #${event.id}: ${auditActionLabel(event.action)}` : ''}
    >
      {event ? <EventDetails event={event} role={role} wardNames={wardNames} /> : null}
    </Drawer>
  );
}

function EventDetails({ event, role, wardNames }: { event: AuditEvent; role: Role; wardNames: ReadonlyMap<string, string> }) {
  const href = entityHref(event, role);
  const label = entityLabel(event, wardNames);
  return (
    <Stack gap="lg">
      <DataList labelWidth="9rem" className="tabular-nums">
        <DataList.Item>
          <DataList.ItemLabel>When</DataList.ItemLabel>
          <DataList.ItemValue>
            <time dateTime={event.at}>{formatDateTime(event.at)}</time>
          </DataList.ItemValue>
        </DataList.Item>
        <DataList.Item>
          <DataList.ItemLabel>Who</DataList.ItemLabel>
          <DataList.ItemValue>
            {actorText(event)}
            {event.userId !== null ? (
              <Text span c="dimmed">
                {' '}
                (user ID {event.userId})
              </Text>
            ) : null}
          </DataList.ItemValue>
        </DataList.Item>
        <DataList.Item>
          <DataList.ItemLabel>Action</DataList.ItemLabel>
          <DataList.ItemValue>
            {auditActionLabel(event.action)} <Code>{event.action}</Code>
          </DataList.ItemValue>
        </DataList.Item>
        <DataList.Item>
          <DataList.ItemLabel>Record</DataList.ItemLabel>
          <DataList.ItemValue>
            <Stack gap={2} align="flex-start">
              {href ? (
                <Anchor component={Link} to={href}>
                  Open {label}
                </Anchor>
              ) : (
                <Text span>{label}</Text>
              )}
              <Anchor component={Link} to={entitySearchHref(event)} size="sm">
                Every event for {label}
              </Anchor>
            </Stack>
          </DataList.ItemValue>
        </DataList.Item>
        <DataList.Item>
          <DataList.ItemLabel>Hash</DataList.ItemLabel>
          <DataList.ItemValue>
            <Hash value={event.hash} />
          </DataList.ItemValue>
        </DataList.Item>
        <DataList.Item>
          <DataList.ItemLabel>Previous hash</DataList.ItemLabel>
          <DataList.ItemValue>
            <Hash value={event.prevHash} />
          </DataList.ItemValue>
        </DataList.Item>
      </DataList>
      <Stack gap="xs" component="section" aria-labelledby="audit-event-details">
        <Title order={3} id="audit-event-details">
          What was recorded
        </Title>
        <AuditSummaryList summary={event.summary} />
      </Stack>
    </Stack>
  );
}
