import type { ReactNode } from 'react';
import { Group, Table, Text, VisuallyHidden } from '@mantine/core';
import { LIMIT_KEYS, populationLabel, ruleKey, type LimitKey } from '@lockstep/shared';
import { LIMIT_LABELS, parameterRows, ruleTitle, type RuleView } from '../utils/rule-rows';
import classes from './library.module.css';
import { PerKgBadge } from './per-kg-badge';

const isHard = (key: LimitKey) => key === 'hardMin' || key === 'hardMax';

function NotSet() {
  return (
    <>
      <Text span c="dimmed" aria-hidden>
        –
      </Text>
      <VisuallyHidden>not set</VisuallyHidden>
    </>
  );
}

export interface RulesTableProps {
  rules: readonly RuleView[];
  /** The table's accessible name, e.g. "Limit rules". */
  label: string;
  /** Shown in place of the rows when there are none. */
  empty?: ReactNode;
}

/**
 * Limit rules, one band per drug and concentration with a row per limited parameter. One table
 * for all rules, so every limit column lines up from the first drug to the last.
 */
export function RulesTable({ rules, label, empty }: RulesTableProps) {
  const limitHeaders = LIMIT_KEYS.map((key) => (
    <Table.Th key={key} scope="col" className={`${classes.limitHeader} ${isHard(key) ? classes.hardLimit : ''}`}>
      {LIMIT_LABELS[key]}
    </Table.Th>
  ));

  return (
    <Table.ScrollContainer minWidth={640}>
      <Table aria-label={label} tabularNums withTableBorder>
        <Table.Thead>
          <Table.Tr>
            <Table.Th scope="col" w="34%">
              Parameter
            </Table.Th>
            {limitHeaders}
          </Table.Tr>
        </Table.Thead>
        {rules.length === 0 ? (
          <Table.Tbody>
            <Table.Tr>
              <Table.Td colSpan={5}>
                {empty ?? (
                  <Text size="sm" c="dimmed">
                    No rules.
                  </Text>
                )}
              </Table.Td>
            </Table.Tr>
          </Table.Tbody>
        ) : null}
        {rules.map((rule) => (
          <Table.Tbody key={ruleKey(rule)}>
            <Table.Tr className={classes.ruleHeading}>
              <Table.Th scope="rowgroup" colSpan={5}>
                <Group gap="xs">
                  <Text span fw={600} size="sm">
                    {ruleTitle(rule)}
                  </Text>
                  {rule.perKg ? <PerKgBadge /> : null}
                  {rule.population === 'paediatric' ? (
                    <Text span size="sm" c="dimmed">
                      {populationLabel(rule)}
                    </Text>
                  ) : null}
                </Group>
              </Table.Th>
            </Table.Tr>
            {parameterRows(rule).map((row) => (
              <Table.Tr key={row.field}>
                <Table.Th scope="row" className={classes.parameterCell}>
                  {row.label}
                  {row.ceiling ? (
                    <Text span size="xs" c="dimmed">
                      {' '}
                      (ceiling {row.ceiling})
                    </Text>
                  ) : null}
                </Table.Th>
                {LIMIT_KEYS.map((key) => (
                  <Table.Td key={key} className={`${classes.limitCell} ${isHard(key) ? classes.hardLimit : ''}`}>
                    {row.limits[key] ?? <NotSet />}
                  </Table.Td>
                ))}
              </Table.Tr>
            ))}
          </Table.Tbody>
        ))}
      </Table>
    </Table.ScrollContainer>
  );
}
