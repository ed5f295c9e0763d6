import { Button, Group, Paper, Stack, Text } from '@mantine/core';
import { IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { formatDose, type SyringeReleaseResponse } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';

/** The release code, large and clear, and the way to its label. */
export function ReleaseResult({ release, onDone }: { release: SyringeReleaseResponse; onDone: () => void }) {
  return (
    <Stack gap="md">
      <Paper withBorder radius="md" p="lg" ta="center" bg="var(--mantine-color-lagoon-0)">
        <Text size="sm" c="dimmed">
          Release code
        </Text>
        <Text ff="monospace" fw={700} fz={44} lh={1.2} style={{ letterSpacing: '0.12em' }} data-testid="release-code">
          {release.releaseCode}
        </Text>
        <Text size="sm" className="tabular-nums">
          {formatDose(release.totalAmount, release.doseUnit)} in {formatDose(release.volumeMl, 'mL')} · batch {release.batch} · expires{' '}
          {formatDateTime(release.expiresAt)}
        </Text>
      </Paper>
      <Text size="sm">The nurse-in-charge has been told by e-mail. The bedside check asks for this code from the label.</Text>
      <Group justify="flex-end">
        <Button variant="default" onClick={onDone}>
          Done
        </Button>
        <Button
          component={Link}
          to={paths.releaseLabel.getHref(release.orderId, release.id)}
          leftSection={<IconPrinter size={16} aria-hidden />}
        >
          Print label
        </Button>
      </Group>
    </Stack>
  );
}
