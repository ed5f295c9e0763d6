import { Badge, Table, Text } from '@mantine/core';
import { IconAlertOctagon } from '@tabler/icons-react';
import { formatDose, NEWS2_CREDIT, type ObservationResponse } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { isUnacceptableSedation } from '../utils/sedation';
import { News2Cell, VitalsCell } from './news2-cell';

/** The observations, newest first, every figure in its own column. */
export function ObservationsTable({ observations }: { observations: readonly ObservationResponse[] }) {
  if (observations.length === 0) {
    return <Text c="dimmed">No observations recorded yet.</Text>;
  }
  const newestFirst = [...observations].sort((a, b) => Date.parse(b.at) - Date.parse(a.at));
  return (
    <Table.ScrollContainer minWidth={900}>
      <Table striped highlightOnHover withTableBorder aria-label="Observations">
        <Table.Thead>
          <Table.Tr>
            <Table.Th scope="col">Time</Table.Th>
            <Table.Th scope="col">Pain</Table.Th>
            <Table.Th scope="col">Sedation</Table.Th>
            <Table.Th scope="col">Resp. rate</Table.Th>
            <Table.Th scope="col">SpO2</Table.Th>
            <Table.Th scope="col">Oxygen and vitals</Table.Th>
            <Table.Th scope="col">NEWS2</Table.Th>
            <Table.Th scope="col">Attempts</Table.Th>
            <Table.Th scope="col">Delivered</Table.Th>
            <Table.Th scope="col">Volume infused</Table.Th>
            <Table.Th scope="col">Syringe left</Table.Th>
            <Table.Th scope="col">Recorded by</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {newestFirst.map((observation) => (
            <Table.Tr key={observation.id}>
              <Table.Th scope="row" fw={400}>
                {formatDateTime(observation.at)}
              </Table.Th>
              <Table.Td>{observation.painScore}/10</Table.Td>
              <Table.Td>
                {isUnacceptableSedation(observation.sedationLevel) ? (
                  <Badge color="red" variant="filled" leftSection={<IconAlertOctagon size={12} aria-hidden />}>
                    {observation.sedationLevel}: unacceptable
                  </Badge>
                ) : (
                  observation.sedationLevel
                )}
              </Table.Td>
              <Table.Td>{observation.respiratoryRate}/min</Table.Td>
              <Table.Td>{observation.spo2} %</Table.Td>
              <Table.Td>
                <VitalsCell observation={observation} />
              </Table.Td>
              <Table.Td>
                <News2Cell observation={observation} />
              </Table.Td>
              <Table.Td>{observation.attempts}</Table.Td>
              <Table.Td>{observation.delivered}</Table.Td>
              <Table.Td>{formatDose(observation.volumeInfusedMl, 'mL')}</Table.Td>
              <Table.Td>{formatDose(observation.syringeRemainingMl, 'mL')}</Table.Td>
              <Table.Td>
                {observation.recordedByName}
                {observation.note ? (
                  <Text size="xs" c="dimmed">
                    {observation.note}
                  </Text>
                ) : null}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Text size="xs" c="dimmed" mt={4}>
        {NEWS2_CREDIT}. Scored for adults (16 and over) with a full set; children are judged by age-banded rates instead.
      </Text>
    </Table.ScrollContainer>
  );
}
