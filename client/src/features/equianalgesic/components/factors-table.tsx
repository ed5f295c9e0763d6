import { Badge, Button, Table, Text, VisuallyHidden } from '@mantine/core';
import { IconPencil } from '@tabler/icons-react';
import { formatDose, NO_CONVERSION_FACTOR, tallMan, type Drug, type EquianalgesicFactor } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { describeFactor, isReferenceRow, oralMorphinePerUnit } from '../utils/factor-display';

export interface FactorsTableProps {
  factors: readonly EquianalgesicFactor[];
  /** Pharmacists change factors; everyone else reads them. */
  /** Formulary drugs with no parenteral row. */
  missing?: readonly Drug[];
  canEdit: boolean;
  onEdit: (factor: EquianalgesicFactor) => void;
  onSet?: (drug: Drug) => void;
}

/** Pharmacy's equianalgesic table: each factor with its source, and who changed it when. */
export function FactorsTable({ factors, missing = [], canEdit, onEdit, onSet }: FactorsTableProps) {
  return (
    <Table.ScrollContainer minWidth={720}>
      <Table striped verticalSpacing="sm" aria-label="Equianalgesic factors">
        <Table.Thead>
          <Table.Tr>
            <Table.Th scope="col">Drug</Table.Th>
            <Table.Th scope="col">Route</Table.Th>
            <Table.Th scope="col">Equal to 10 mg parenteral morphine</Table.Th>
            <Table.Th scope="col">Source</Table.Th>
            <Table.Th scope="col">Changed</Table.Th>
            {canEdit ? (
              <Table.Th scope="col">
                <VisuallyHidden>Change</VisuallyHidden>
              </Table.Th>
            ) : null}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {factors.map((factor) => {
            const reference = isReferenceRow(factor, factors);
            const perUnit = oralMorphinePerUnit(factor, factors);
            return (
              <Table.Tr key={`${factor.drugId}-${factor.route}`} data-testid={`factor-${factor.genericName}-${factor.route}`}>
                <Table.Td fw={600}>{tallMan(factor.genericName)}</Table.Td>
                <Table.Td>{factor.route === 'oral' ? 'Oral' : 'Parenteral'}</Table.Td>
                <Table.Td>
                  <Text fw={700} className="tabular-nums">
                    {formatDose(factor.amount, factor.unit)}
                  </Text>
                  <Text size="xs" c="dimmed">
                    {describeFactor(factor)}
                    {perUnit ? ` · ${perUnit}` : ''}
                  </Text>
                  {reference ? (
                    <Badge variant="light" color="gray" mt={4}>
                      Reference
                    </Badge>
                  ) : null}
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{factor.source}</Text>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{factor.changedByName ?? 'Shipped default'}</Text>
                  <Text size="xs" c="dimmed">
                    <time dateTime={factor.changedAt}>{formatDateTime(factor.changedAt)}</time>
                  </Text>
                </Table.Td>
                {canEdit ? (
                  <Table.Td>
                    {reference ? null : (
                      <Button
                        size="xs"
                        variant="light"
                        leftSection={<IconPencil size={14} aria-hidden />}
                        onClick={() => onEdit(factor)}
                        aria-label={`Change ${tallMan(factor.genericName)} ${factor.route}`}
                      >
                        Change
                      </Button>
                    )}
                  </Table.Td>
                ) : null}
              </Table.Tr>
            );
          })}
          {missing.map((drug) => (
            <Table.Tr key={`${drug.id}-missing`} data-testid={`factor-${drug.genericName}-missing`}>
              <Table.Td fw={600}>{tallMan(drug.genericName)}</Table.Td>
              <Table.Td>Parenteral</Table.Td>
              <Table.Td colSpan={3}>
                <Text size="sm" c="dimmed">
                  {NO_CONVERSION_FACTOR}: its PCAs show no oral-morphine figure.
                </Text>
              </Table.Td>
              {canEdit ? (
                <Table.Td>
                  <Button
                    size="xs"
                    variant="light"
                    onClick={() => onSet?.(drug)}
                    aria-label={`Set ${tallMan(drug.genericName)} parenteral`}
                  >
                    Set
                  </Button>
                </Table.Td>
              ) : null}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
