import type { ReactNode } from 'react';
import { Badge, EmptyState, Group, Stack, Table, Text, Title, VisuallyHidden } from '@mantine/core';
import { IconArrowRight, IconEqual, IconMinus, IconPencil, IconPlus } from '@tabler/icons-react';
import { isEmptyDiff, type LibraryDiff } from '@lockstep/shared';
import { changeRows, largeChangesFirst } from '../utils/diff-rows';
import type { RuleView } from '../utils/rule-rows';
import { ChangeDirectionBadge } from './change-direction';
import { LargeChangeBadge } from './large-change-badge';
import classes from './library.module.css';
import { RulesTable } from './rules-table';

export interface LibraryDiffViewProps {
  diff: LibraryDiff;
  /** The new side's rules, for whether a changed rule is per kg. */
  rules: readonly RuleView[];
  /** e.g. "this version" or "this file". */
  subject: string;
}

function Section({
  title,
  count,
  color,
  icon,
  children,
}: {
  title: string;
  count: number;
  color: string;
  icon: ReactNode;
  children: ReactNode;
}) {
  return (
    <Stack gap="xs">
      <Group gap="xs">
        <Badge color={color} variant="light" leftSection={icon} className="tabular-nums">
          {title} ({count})
        </Badge>
      </Group>
      {children}
    </Stack>
  );
}

/** What a version (or a file) changes against the active version: changed limits, added and removed rules. */
export function LibraryDiffView({ diff, rules, subject }: LibraryDiffViewProps) {
  if (isEmptyDiff(diff)) {
    return (
      <EmptyState
        size="sm"
        icon={<IconEqual aria-hidden />}
        title="No changes from the active version"
        description={`Every rule and limit in ${subject} is the same as in the active version.`}
      />
    );
  }
  // Large changes (a factor of 2 or more, or to or from no limit) first, each marked.
  const rows = largeChangesFirst(changeRows(diff, rules));
  const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

  return (
    <Stack gap="lg">
      <Title order={3}>Changes from active</Title>
      {rows.length > 0 ? (
        <Section title="Changed limits" count={rows.length} color="grape" icon={<IconPencil size={12} aria-hidden />}>
          <Table.ScrollContainer minWidth={640}>
            <Table aria-label="Changed limits" tabularNums withTableBorder>
              <Table.Thead>
                <Table.Tr>
                  <Table.Th scope="col">Rule</Table.Th>
                  <Table.Th scope="col">Parameter and limit</Table.Th>
                  <Table.Th scope="col">Active → {subject}</Table.Th>
                  <Table.Th scope="col">Change</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {rows.map((row) => (
                  <Table.Tr key={row.key}>
                    <Table.Td fw={600}>{row.rule}</Table.Td>
                    <Table.Td>{row.what}</Table.Td>
                    <Table.Td>
                      <Group gap={6} wrap="nowrap">
                        <span className={classes.was}>{row.from}</span>
                        <IconArrowRight size={14} aria-hidden />
                        <VisuallyHidden>to</VisuallyHidden>
                        <Text span fw={600} size="sm">
                          {row.to}
                        </Text>
                      </Group>
                    </Table.Td>
                    <Table.Td>
                      <Group gap={4} wrap="wrap">
                        {row.large ? <LargeChangeBadge change={row.large} /> : null}
                        <ChangeDirectionBadge direction={row.direction} />
                      </Group>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
        </Section>
      ) : null}
      {diff.added.length > 0 ? (
        <Section title="Added rules" count={diff.added.length} color="teal" icon={<IconPlus size={12} aria-hidden />}>
          <RulesTable rules={diff.added} label="Added rules" />
        </Section>
      ) : null}
      {diff.removed.length > 0 ? (
        <Section title="Removed rules" count={diff.removed.length} color="red" icon={<IconMinus size={12} aria-hidden />}>
          <RulesTable rules={diff.removed} label="Removed rules" />
        </Section>
      ) : null}
      <Text size="xs" c="dimmed">
        {plural(rows.length, 'limit')} changed, {plural(diff.added.length, 'rule')} added, {plural(diff.removed.length, 'rule')} removed.
      </Text>
    </Stack>
  );
}
