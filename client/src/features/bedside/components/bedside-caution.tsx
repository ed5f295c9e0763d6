import { Group, Text } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { DECISION_SUPPORT_CAUTION, LOCAL_POLICY_CAUTION } from '@lockstep/shared';

/** The decision-support caution every bedside screen carries. */
export function BedsideCaution() {
  return (
    <Group gap={6} wrap="nowrap" align="flex-start" c="dimmed">
      <IconInfoCircle size={16} aria-hidden style={{ flexShrink: 0, marginTop: 2 }} />
      <Text size="xs" c="dimmed">
        {DECISION_SUPPORT_CAUTION} {LOCAL_POLICY_CAUTION}
      </Text>
    </Group>
  );
}
