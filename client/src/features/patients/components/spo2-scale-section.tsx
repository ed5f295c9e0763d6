import { useState } from 'react';
import { Alert, Button, Group, Modal, Stack, Text, Title } from '@mantine/core';
import { IconAlertCircle, IconAlertTriangle, IconLungs } from '@tabler/icons-react';
import { ageInYears, type Patient, PRESCRIBING_ROLES, type Spo2Scale } from '@lockstep/shared';
import { useUpdateSpo2Scale } from '@/api/patients/update-spo2-scale';
import { useWardPolicy } from '@/api/wards/get-ward-policy';
import { useWards } from '@/api/wards/get-wards';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { useCurrentUser } from '@/lib/auth/use-session';
import { notifySuccess } from '@/lib/notify';
import { otherSpo2Scale, SPO2_SCALE_NAMES, spo2BandsText, spo2ScaleChangeConsequence } from '../utils/spo2-scale';

/** NEWS2 starts at 16 (Royal College of Physicians, NEWS2, 2017); children's SpO2 keeps scale 1's bands (the breathing flags). */
const NEWS2_FROM_AGE = 16;

/**
 * The patient's NEWS2 SpO2 scale, shown to everyone; a prescriber changes it after a confirmation
 * that names what the change does (`PUT /api/patients/:id/spo2-scale`, audited).
 */
export function Spo2ScaleSection({ patient }: { patient: Patient }) {
  const { role } = useCurrentUser();
  const canChange = PRESCRIBING_ROLES.includes(role);
  const policy = useWardPolicy(patient.wardId).data;
  const update = useUpdateSpo2Scale();
  // One key per confirmation dialog: a double-click or a retry changes the scale once.
  const idempotency = useIdempotencyKey();
  const [confirming, setConfirming] = useState<Spo2Scale | null>(null);
  const current = patient.spo2Scale;
  const next = otherSpo2Scale(current);
  const ward = useWards().data?.find((candidate) => candidate.id === patient.wardId);
  // As the breathing flags read it: a child, or anyone on a paediatric ward, is flagged by the children's bands, SpO2 on scale 1's.
  const child = ageInYears(patient.dateOfBirth) < NEWS2_FROM_AGE || ward?.population === 'paediatric';

  const close = () => {
    update.reset();
    idempotency.renew();
    setConfirming(null);
  };
  const confirm = (scale: Spo2Scale) =>
    update.mutate(
      { patientId: patient.id, spo2Scale: scale, idempotencyKey: idempotency.key },
      {
        onSuccess: (saved) => {
          idempotency.renew();
          notifySuccess(
            `SpO2 ${SPO2_SCALE_NAMES[saved.spo2Scale].toLowerCase()}`,
            `${spo2BandsText(saved.spo2Scale, policy)}, from the next observation.`,
          );
          setConfirming(null);
        },
      },
    );

  return (
    <Stack gap="xs" component="section" aria-labelledby="spo2-scale-heading">
      <Title order={2} id="spo2-scale-heading">
        NEWS2 SpO2 scale
      </Title>
      <Group gap={6} wrap="nowrap" align="flex-start">
        <IconLungs size={18} aria-hidden style={{ flex: 'none', marginTop: 2 }} />
        <Text size="sm" fw={600} data-testid="spo2-scale-recorded">
          {SPO2_SCALE_NAMES[current]}
        </Text>
      </Group>
      <Text size="sm">{spo2BandsText(child ? '1' : current, policy)}.</Text>
      {child ? (
        <Text size="sm" c="dimmed">
          Children (under {NEWS2_FROM_AGE}, or on a paediatric ward): SpO2 is flagged on scale 1’s bands whatever the scale, and NEWS2 is
          not scored.
        </Text>
      ) : null}
      {canChange ? (
        <Stack gap="xs" align="flex-start">
          <Text size="sm" c="dimmed">
            Scale 2 is for confirmed hypercapnic respiratory failure only (Royal College of Physicians, NEWS2, 2017).
          </Text>
          <Button size="xs" variant="default" onClick={() => setConfirming(next)}>
            Change to scale {next}
          </Button>
        </Stack>
      ) : (
        <Text size="sm" c="dimmed">
          A prescriber chooses the scale.
        </Text>
      )}
      <Modal opened={confirming !== null} onClose={close} title={confirming ? `Use SpO2 scale ${confirming}?` : ''} size="md">
        {confirming ? (
          <Stack gap="md">
            <Alert
              color={confirming === '2' ? 'orange' : 'blue'}
              variant="light"
              icon={<IconAlertTriangle aria-hidden />}
              title={SPO2_SCALE_NAMES[confirming]}
            >
              <Text size="sm">{spo2ScaleChangeConsequence(confirming, policy)}</Text>
            </Alert>
            {update.isError ? (
              <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The scale was not changed">
                {errorMessage(update.error)}
              </Alert>
            ) : null}
            <Group justify="flex-end">
              <Button variant="default" onClick={close} data-autofocus>
                Cancel
              </Button>
              <Button color={confirming === '2' ? 'orange' : undefined} onClick={() => confirm(confirming)} loading={update.isPending}>
                Use scale {confirming}
              </Button>
            </Group>
          </Stack>
        ) : null}
      </Modal>
    </Stack>
  );
}
