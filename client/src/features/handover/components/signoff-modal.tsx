import { useState } from 'react';
import { Alert, Button, Checkbox, Group, Modal, Stack, Table, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { z } from 'zod';
import { DECISION_SUPPORT_CAUTION, drugAndConcentration, type HandoverRow, regimenParts, type SignoffRole } from '@lockstep/shared';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { useSignOff } from '../api/sign-off';

// The server's own words for the same refusal (handover-signoffs.service.ts).
export const PUMP_CONFIRM_MESSAGE = 'Confirm the pump settings match the order; if they do not, stop and escalate before taking over';

const incomingSchema = z.object({ pumpSettingsMatch: z.literal(true, { error: PUMP_CONFIRM_MESSAGE }) });
const outgoingSchema = z.object({ pumpSettingsMatch: z.boolean() });

export interface SignoffModalProps {
  wardId: number;
  row: HandoverRow;
  role: SignoffRole;
  onClose: () => void;
}

/**
 * One nurse's handover confirmation of one PCA. The incoming nurse compares the pump with the
 * order shown here, setting by setting, and ticks that they match.
 */
export function SignoffModal({ wardId, row, role, onClose }: SignoffModalProps) {
  const mutation = useSignOff(wardId);
  const [refusals, setRefusals] = useState<string[]>([]);
  const form = useForm({
    initialValues: { pumpSettingsMatch: false },
    validate: zod4Resolver(role === 'incoming' ? incomingSchema : outgoingSchema),
  });

  const submit = form.onSubmit(({ pumpSettingsMatch }) => {
    setRefusals([]);
    mutation.mutate(
      { orderId: row.orderId, role, ...(role === 'incoming' && pumpSettingsMatch ? { pumpSettingsMatch: true as const } : {}) },
      {
        onSuccess: (signoff) => {
          notifySuccess('Handover signed', `${signoff.nurseName} signed as the ${role} nurse for ${row.patient.name}.`);
          onClose();
        },
        onError: (error) => setRefusals(applyServerErrors(form, error)),
      },
    );
  });

  return (
    <Modal opened onClose={onClose} title={`Sign off (${role}): ${row.patient.name}`} size="lg">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm">
            Bed {row.bed} · MRN {row.patient.mrn}.{' '}
            {role === 'incoming'
              ? 'Compare each setting on the pump with the order below before you take this PCA over.'
              : 'You confirm that you have handed this PCA over to the incoming nurse.'}
          </Text>
          <Table withTableBorder tabularNums aria-label="The order's regimen" verticalSpacing={4}>
            <Table.Tbody>
              {[
                { label: 'Drug and concentration', value: drugAndConcentration(row) },
                ...regimenParts({ ...row, ...row.regimen }, { showUnset: true }),
              ].map((line) => (
                <Table.Tr key={line.label}>
                  <Table.Th scope="row" w="45%" fw={500}>
                    {line.label}
                  </Table.Th>
                  <Table.Td fw={600}>{line.value}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
          {refusals.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not signed" role="alert">
              {refusals.join(' ')}
            </Alert>
          ) : null}
          {role === 'incoming' ? (
            <Checkbox
              label="The pump settings match the order"
              description="If anything differs, do not sign: stop and escalate before taking over."
              size="md"
              required
              {...form.getInputProps('pumpSettingsMatch', { type: 'checkbox' })}
            />
          ) : null}
          <Text size="xs" c="dimmed">
            {DECISION_SUPPORT_CAUTION}
          </Text>
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Back
            </Button>
            <Button type="submit" loading={mutation.isPending}>
              Sign as {role} nurse
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
