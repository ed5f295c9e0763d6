import { useState } from 'react';
import { Alert, Button, Card, Group, PasswordInput, SegmentedControl, Stack, Text, Textarea, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconPlayerPause, IconPlayerPlay, IconVaccine } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { formatDose, MIN_REASON_LENGTH, pauseActions, syringeState, type NaloxoneUnit, type OrderDetail } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import { PausedBadge } from '@/components/ui/paused-badge';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';
import { formatDateTime } from '@/utils/format-date';
import { paths } from '@/config/paths';
import { usePausePca, usePauseState, useRecordNaloxone } from '@/api/orders/pca-pause';

type Form = 'pause' | 'naloxone' | null;

const reasonRule = (value: string) =>
  value.trim().length >= MIN_REASON_LENGTH ? null : `Give a reason of at least ${MIN_REASON_LENGTH} characters`;

/**
 * The PCA's pause: whether it is paused and why, the watch after naloxone, and (for nurses on a
 * running PCA) pausing, recording naloxone given and the two-nurse resume.
 */
export function PcaPausePanel({ order, mayAct }: { order: OrderDetail; mayAct: boolean }) {
  const state = usePauseState(order.id).data;
  const [open, setOpen] = useState<Form>(null);
  if (!state) return null;
  const running = order.status === 'active' && syringeState(order.releases) === 'running';
  const actions = mayAct ? pauseActions(running, state.paused) : [];
  const current = state.pauses.find((pause) => pause.resumedAt === null);
  if (!state.paused && actions.length === 0 && state.pauses.length === 0) return null;

  return (
    <Card withBorder component="section" aria-labelledby="pca-pause-heading">
      <Stack gap="sm">
        <Group justify="space-between">
          <Group gap="sm">
            <Title order={2} id="pca-pause-heading" size="h3">
              Pause
            </Title>
            {state.paused ? <PausedBadge /> : <Text c="dimmed">Running</Text>}
          </Group>
          <Group gap="xs">
            {actions.includes('pause') && (
              <Button variant="default" leftSection={<IconPlayerPause size={18} aria-hidden />} onClick={() => setOpen('pause')}>
                Pause PCA
              </Button>
            )}
            {actions.includes('resume') && (
              <Button
                component={Link}
                to={paths.bedsideResume.getHref(order.id)}
                variant="default"
                leftSection={<IconPlayerPlay size={18} aria-hidden />}
              >
                Resume PCA
              </Button>
            )}
            {actions.includes('naloxone') && (
              <Button color="red" leftSection={<IconVaccine size={18} aria-hidden />} onClick={() => setOpen('naloxone')}>
                Record naloxone
              </Button>
            )}
          </Group>
        </Group>
        {current && (
          <Text>
            Paused {formatDateTime(current.pausedAt)} by {current.pausedByName}: {current.reason}. No demand doses are expected while
            paused; keep recording observations.
          </Text>
        )}
        {state.naloxoneWatchUntil && Date.parse(state.naloxoneWatchUntil) > Date.now() && (
          <Alert color="red" title="After naloxone">
            Observe every {state.naloxoneWatchEveryMinutes} minutes until at least {formatDateTime(state.naloxoneWatchUntil)}: naloxone can
            wear off before the opioid.
          </Alert>
        )}
        {open === 'pause' && <PauseForm orderId={order.id} onDone={() => setOpen(null)} />}
        {open === 'naloxone' && <NaloxoneForm orderId={order.id} onDone={() => setOpen(null)} />}
      </Stack>
    </Card>
  );
}

function Problems({ messages }: { messages: string[] }) {
  if (messages.length === 0) return null;
  return (
    <Alert color="red" title="Not recorded">
      {messages.join(' ')}
    </Alert>
  );
}

function PauseForm({ orderId, onDone }: { orderId: number; onDone: () => void }) {
  const pause = usePausePca(orderId);
  // One key per opening of the form: a double-click or a retry is one pause.
  const idempotency = useIdempotencyKey();
  const [problems, setProblems] = useState<string[]>([]);
  const form = useForm({ initialValues: { reason: '' }, validate: { reason: reasonRule } });
  const submit = form.onSubmit((values) =>
    pause.mutate(
      { request: { reason: values.reason.trim() }, idempotencyKey: idempotency.key },
      {
        onSuccess: () => {
          idempotency.renew();
          onDone();
        },
        onError: (error) => setProblems(applyServerErrors(form, error)),
      },
    ),
  );
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        <Problems messages={problems} />
        <Textarea label="Reason for pausing" withAsterisk autosize minRows={2} {...form.getInputProps('reason')} />
        <Group>
          <Button type="submit" loading={pause.isPending}>
            Pause PCA
          </Button>
          <Button variant="subtle" onClick={onDone}>
            Cancel
          </Button>
        </Group>
      </Stack>
    </form>
  );
}

type NaloxoneValues = { dose: NumberFieldValue; doseUnit: NaloxoneUnit; givenAt: string; signature: { password: string } };

function NaloxoneForm({ orderId, onDone }: { orderId: number; onDone: () => void }) {
  const record = useRecordNaloxone(orderId);
  // One key per opening of the form: a double-click or a retry records the naloxone once.
  const idempotency = useIdempotencyKey();
  const [problems, setProblems] = useState<string[]>([]);
  const form = useForm<NaloxoneValues>({
    initialValues: { dose: '', doseUnit: 'mcg', givenAt: '', signature: { password: '' } },
    validate: {
      dose: (value) => {
        const dose = readNumber(value);
        return dose === null || dose === undefined || dose <= 0 ? 'Enter the naloxone dose' : null;
      },
      givenAt: (value) => (value === '' || Number.isFinite(Date.parse(value)) ? null : 'Enter when naloxone was given'),
      signature: { password: (value) => (value ? null : 'Enter your password to sign') },
    },
  });
  const submit = form.onSubmit((values) =>
    record.mutate(
      {
        request: {
          dose: readNumber(values.dose) as number,
          doseUnit: values.doseUnit,
          givenAt: values.givenAt ? new Date(values.givenAt).toISOString() : undefined,
          signature: { password: values.signature.password },
        },
        idempotencyKey: idempotency.key,
      },
      {
        onSuccess: () => {
          idempotency.renew();
          onDone();
        },
        onError: (error) => setProblems(applyServerErrors(form, error)),
      },
    ),
  );
  const dose = readNumber(form.values.dose);
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="sm">
        <Text>Recording naloxone pauses the PCA, raises an urgent flag and e-mails the prescriber.</Text>
        <Problems messages={problems} />
        <Group align="flex-end">
          <NumberField label="Naloxone dose" withAsterisk {...form.getInputProps('dose')} />
          <SegmentedControl data={['mcg', 'mg']} {...form.getInputProps('doseUnit')} aria-label="Unit" />
        </Group>
        {typeof dose === 'number' && dose > 0 && <Text size="sm">{formatDose(dose, form.values.doseUnit)}</Text>}
        <TextInput type="datetime-local" label="Given at" description="Leave empty for now" {...form.getInputProps('givenAt')} />
        <PasswordInput
          label="Your password, to sign"
          withAsterisk
          autoComplete="current-password"
          {...form.getInputProps('signature.password')}
        />
        <Group>
          <Button type="submit" color="red" loading={record.isPending}>
            Record naloxone
          </Button>
          <Button variant="subtle" onClick={onDone}>
            Cancel
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
