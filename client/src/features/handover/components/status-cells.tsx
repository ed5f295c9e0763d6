import type { ComponentType } from 'react';
import { Button, Group, Stack, Text } from '@mantine/core';
import {
  IconCircleCheck,
  IconCircleDashed,
  IconClipboardCheck,
  IconHourglass,
  IconScale,
  IconCalendarExclamation,
  type IconProps,
} from '@tabler/icons-react';
import type { HandoverRow, PendingTask, SignoffRole } from '@lockstep/shared';
import { formatSince } from '@/utils/clock';

const TASK_LOOK: Record<PendingTask['code'], { label: string; color: string; bg: string; icon: ComponentType<IconProps> }> = {
  awaiting_verification: { label: 'Awaiting verification', color: 'slate.9', bg: 'slate.1', icon: IconHourglass },
  awaiting_bedside_check: { label: 'Awaiting bedside check', color: 'slate.9', bg: 'slate.1', icon: IconClipboardCheck },
  reconciliation_discrepancy: { label: 'Reconciliation discrepancy', color: 'orange.9', bg: 'orange.0', icon: IconScale },
  review_date_passed: { label: 'Review date passed', color: 'orange.9', bg: 'orange.0', icon: IconCalendarExclamation },
};

/** Short labelled tags (they wrap, never truncate) for what waits on someone, and since when. */
export function TasksCell({ tasks, now }: { tasks: readonly PendingTask[]; now: Date }) {
  if (tasks.length === 0)
    return (
      <Text size="xs" c="dimmed">
        None
      </Text>
    );
  return (
    <Stack gap={4}>
      {tasks.map((task) => {
        const look = TASK_LOOK[task.code];
        const Icon = look.icon;
        return (
          <div key={task.code}>
            <Group
              gap={4}
              wrap="nowrap"
              px={5}
              py={1}
              bg={look.bg}
              c={look.color}
              data-task={task.code}
              style={{ borderRadius: 4, width: 'fit-content' }}
            >
              <Icon size={12} aria-hidden style={{ flexShrink: 0 }} />
              <Text size="xs" fw={600} c="inherit" lh={1.3}>
                {look.label}
              </Text>
            </Group>
            <Text size="xs" c="dimmed">
              {formatSince(task.since, now)}
            </Text>
          </div>
        );
      })}
    </Stack>
  );
}

const ROLE_WORD: Record<SignoffRole, string> = { outgoing: 'Outgoing', incoming: 'Incoming' };

function SignoffLine({ role, row }: { role: SignoffRole; row: HandoverRow }) {
  const signoff = row.signoffs.find((candidate) => candidate.role === role);
  if (!signoff) {
    return (
      <Group gap={4} wrap="nowrap" c="dimmed">
        <IconCircleDashed size={14} aria-hidden />
        <Text size="xs" c="inherit" style={{ whiteSpace: 'nowrap' }}>
          {ROLE_WORD[role]}: not signed
        </Text>
      </Group>
    );
  }
  return (
    <Group gap={4} wrap="nowrap" align="flex-start" c="teal.9">
      <IconCircleCheck size={14} aria-hidden style={{ flexShrink: 0, marginTop: 2 }} />
      <Text size="xs" fw={600} c="inherit">
        {ROLE_WORD[role]} ✓ {signoff.nurseName}
        {role === 'incoming' && signoff.pumpSettingsMatch ? ' (pump checked)' : ''}
      </Text>
    </Group>
  );
}

export interface SignoffCellProps {
  row: HandoverRow;
  /** Only nurses and charge nurses sign; others see the status alone. */
  onSignOff?: (row: HandoverRow, role: SignoffRole) => void;
}

/** Who has confirmed this PCA at this handover, and the actions still open. */
export function SignoffCell({ row, onSignOff }: SignoffCellProps) {
  if (row.status !== 'active')
    return (
      <Text size="xs" c="dimmed">
        Not running: no sign-off
      </Text>
    );
  const missing = (['outgoing', 'incoming'] as const).filter((role) => !row.signoffs.some((signoff) => signoff.role === role));
  return (
    <Stack gap={2}>
      <SignoffLine role="outgoing" row={row} />
      <SignoffLine role="incoming" row={row} />
      {onSignOff && missing.length > 0 ? (
        <Stack gap={4} mt={2} align="flex-start" className="no-print">
          {missing.map((role) => (
            <Button
              key={role}
              size="compact-xs"
              variant="light"
              aria-label={`Sign off (${role}): ${row.patient.name}, bed ${row.bed}`}
              onClick={() => onSignOff(row, role)}
            >
              Sign off ({role})
            </Button>
          ))}
        </Stack>
      ) : null}
    </Stack>
  );
}
