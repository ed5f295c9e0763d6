import { Button, Group, Paper, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconArrowLeft, IconCircleCheck, IconClipboardPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { NEWS2_CREDIT, type RecordedObservation } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';
import { bySeverityThenNewest } from '../utils/flags';
import { FlagCard } from './flag-card';
import { News2Cell } from './news2-cell';

export interface ObservationSavedProps {
  orderId: number;
  observation: RecordedObservation;
  onRecordAnother: () => void;
}

/** What the observation raised, urgent first and impossible to miss; then the way back. */
export function ObservationSaved({ orderId, observation, onRecordAnother }: ObservationSavedProps) {
  const flags = [...observation.flags].sort(bySeverityThenNewest);
  return (
    <Stack gap="lg">
      <Paper withBorder radius="md" p="lg">
        <Group gap="md" wrap="nowrap">
          <ThemeIcon color="teal" size={44} radius="xl" variant="light">
            <IconCircleCheck size={30} aria-hidden />
          </ThemeIcon>
          <div>
            <Title order={2}>Observation saved</Title>
            <Text c="dimmed">
              {formatDateTime(observation.at)}, recorded by {observation.recordedByName}
            </Text>
          </div>
        </Group>
        <Stack gap={4} mt="md" aria-label="NEWS2">
          <News2Cell observation={observation} />
          <Text size="xs" c="dimmed">
            {NEWS2_CREDIT}
          </Text>
        </Stack>
      </Paper>
      {flags.length > 0 ? (
        <Stack gap="sm" component="section" aria-labelledby="raised-flags-heading">
          <Title order={2} id="raised-flags-heading">
            {flags.length === 1 ? 'This observation raised a flag' : `This observation raised ${flags.length} flags`}
          </Title>
          {flags.map((flag) => (
            <FlagCard key={flag.id} flag={flag} announce />
          ))}
          <Text size="sm" c="dimmed">
            Act on each flag now. Urgent flags were e-mailed to the prescriber and the nurse in charge; acknowledge each one on the PCA page
            once it is dealt with.
          </Text>
        </Stack>
      ) : (
        <Text>No flags raised.</Text>
      )}
      <Group>
        <Button component={Link} to={paths.pca.getHref(orderId)} size="md" leftSection={<IconArrowLeft size={18} aria-hidden />}>
          Open the PCA page
        </Button>
        <Button variant="default" size="md" onClick={onRecordAnother} leftSection={<IconClipboardPlus size={18} aria-hidden />}>
          Record another observation
        </Button>
      </Group>
    </Stack>
  );
}
