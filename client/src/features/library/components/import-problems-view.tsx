import { Alert, List, Stack, Table, Text } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import type { ImportProblemRow } from '../utils/import-problems';

export interface ImportProblemsViewProps {
  fileName: string;
  message: string;
  problems: ImportProblemRow[];
}

/** Every problem the server found in a file, by spreadsheet row and column. */
export function ImportProblemsView({ fileName, message, problems }: ImportProblemsViewProps) {
  const byCell = problems.filter((problem) => problem.row !== null);
  const wholeFile = problems.filter((problem) => problem.row === null);
  return (
    <Stack gap="sm">
      <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title={`${fileName} was not imported`} role="alert">
        <Text size="sm">{message}</Text>
        {wholeFile.length > 0 && wholeFile.some((problem) => problem.message !== message) ? (
          <List size="sm" mt={4}>
            {wholeFile.map((problem) => (
              <List.Item key={problem.key}>{problem.message}</List.Item>
            ))}
          </List>
        ) : null}
      </Alert>
      {byCell.length > 0 ? (
        <Table.ScrollContainer minWidth={480} mah={280}>
          <Table aria-label="Problems in the file" tabularNums withTableBorder stickyHeader>
            <Table.Thead>
              <Table.Tr>
                <Table.Th scope="col" w={70}>
                  Row
                </Table.Th>
                <Table.Th scope="col" w={170}>
                  Column
                </Table.Th>
                <Table.Th scope="col">Problem</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {byCell.map((problem) => (
                <Table.Tr key={problem.key}>
                  <Table.Td>{problem.row}</Table.Td>
                  <Table.Td ff="monospace">{problem.column}</Table.Td>
                  <Table.Td>{problem.message}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      ) : null}
      <Text size="sm" c="dimmed">
        Correct the file (rows are counted as in a spreadsheet, the header is row 1) and drop it again.
      </Text>
    </Stack>
  );
}
