import { Button, Code, Paper, Stack, Table, Text, Title } from '@mantine/core';
import { ROLE_LABELS, type DemoAccounts } from '@lockstep/shared';

export interface DemoAccountsPanelProps {
  demo: DemoAccounts;
  onChoose: (username: string, password: string) => void;
}

/** Demo mode only: the invented staff a visitor may sign in as. Choosing one fills the form. */
export function DemoAccountsPanel({ demo, onChoose }: DemoAccountsPanelProps) {
  const password = demo.password ?? '';
  return (
    <Paper withBorder p="md" radius="md" component="section" aria-labelledby="demo-accounts-title" style={{ alignSelf: 'start' }}>
      <Stack gap="xs">
        <Title order={2} size="h3" id="demo-accounts-title">
          Demo accounts
        </Title>
        {demo.password ? (
          <Text size="sm">
            Every demo account uses the password <Code>{demo.password}</Code>. Choose one to fill in the form, then press Sign in.
          </Text>
        ) : null}
        <Table aria-label="Demo accounts" verticalSpacing={4} fz="sm">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Name</Table.Th>
              <Table.Th>Role</Table.Th>
              <Table.Th>Username</Table.Th>
              <Table.Th>
                <Text span size="sm" fw={600}>
                  Fill in
                </Text>
              </Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {demo.accounts.map((account) => (
              <Table.Tr key={account.username}>
                <Table.Td>{account.displayName}</Table.Td>
                <Table.Td>{ROLE_LABELS[account.role]}</Table.Td>
                <Table.Td>
                  <Code>{account.username}</Code>
                </Table.Td>
                <Table.Td>
                  <Button
                    size="compact-sm"
                    variant="light"
                    aria-label={`Use ${account.username} (${ROLE_LABELS[account.role]})`}
                    onClick={() => onChoose(account.username, password)}
                  >
                    Use
                  </Button>
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Stack>
    </Paper>
  );
}
