import { Box, Container, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { DecisionSupportNote } from '@/components/ui/decision-support-note';
import { LockstepMark } from '@/components/ui/lockstep-mark';
import type { Session } from '@/lib/auth/session-store';
import { useDemoAccounts } from '../api/get-demo-accounts';
import { DemoAccountsPanel } from './demo-accounts-panel';
import { SignInForm, useSignInForm } from './sign-in-form';
import { usePageTitle } from '@/hooks/use-page-title';

export interface SignInScreenProps {
  onSignedIn: (session: Session) => void;
  notice?: string;
}

export function SignInScreen({ onSignedIn, notice }: SignInScreenProps) {
  usePageTitle('Sign in');
  const form = useSignInForm();
  const demoQuery = useDemoAccounts();
  const demo = demoQuery.data?.demo ? demoQuery.data : null;

  const fill = (username: string, password: string) => {
    form.setValues({ username, password });
    form.clearErrors();
  };

  return (
    <Box mih="100vh" bg="slate.0" py={{ base: 'lg', sm: 64 }}>
      <Container size={demo ? 'lg' : 'xs'}>
        <SimpleGrid cols={{ base: 1, md: demo ? 2 : 1 }} spacing="xl">
          <Stack gap="lg">
            <Group gap="sm">
              <LockstepMark size={36} />
              <Text fw={700} fz={24} c="lagoon.8">
                Lockstep
              </Text>
            </Group>
            <Paper withBorder shadow="xs" p="xl" radius="md">
              <Stack gap="lg">
                <div>
                  <Title order={1}>Sign in</Title>
                  <Text size="sm" c="dimmed">
                    PCA orders, pharmacy checks, bedside checks and handover for your ward.
                  </Text>
                </div>
                <SignInForm form={form} onSignedIn={onSignedIn} notice={notice} />
              </Stack>
            </Paper>
            <DecisionSupportNote />
          </Stack>
          {demo ? <DemoAccountsPanel demo={demo} onChoose={fill} /> : null}
        </SimpleGrid>
      </Container>
    </Box>
  );
}
