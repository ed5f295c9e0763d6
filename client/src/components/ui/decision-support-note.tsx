import { Text, type TextProps } from '@mantine/core';

/** The standing reminder that Lockstep supports, and never replaces, clinical judgement. */
export function DecisionSupportNote(props: TextProps) {
  return (
    <Text size="xs" c="dimmed" {...props}>
      Lockstep is decision support. Check every value against the prescriber&apos;s order, local policy and your clinical judgement; local
      protocols override Lockstep&apos;s defaults.
    </Text>
  );
}
