import { useState } from 'react';
import { Alert, Button, Group, Modal, Select, SimpleGrid, Stack, Table, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import {
  DECISION_SUPPORT_CAUTION,
  drugAndConcentration,
  handoverConfirmRefusal,
  PUMP_SETTING_LABELS,
  regimenParts,
  tallMan,
  type HandoverRow,
  type SignoffRole,
} from '@lockstep/shared';
import { SigningPasswordInput } from '@/components/dialogs/signing-password-input';
import { NumberField } from '@/components/ui/number-field';
import { useDrugs } from '@/api/drugs/get-drugs';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useSignOff } from '../api/sign-off';
import {
  emptyPumpReading,
  OPTIONAL_READING_FIELDS,
  PUMP_READING_FIELDS,
  pumpReadingUnit,
  readPumpReading,
  signoffFormErrors,
  type PumpReadingValues,
} from '../utils/pump-reading';

export interface SignoffModalProps {
  wardId: number;
  row: HandoverRow;
  role: SignoffRole;
  onClose: () => void;
}

type SignoffValues = PumpReadingValues & { password: string };

/**
 * One nurse's signed handover confirmation of one PCA. The outgoing nurse sees the order; the
 * incoming nurse reads the pump and types its settings blind (the order is not shown), and the
 * server compares them with the running order. No PCA is confirmed while an urgent flag is open.
 */
export function SignoffModal({ wardId, row, role, onClose }: SignoffModalProps) {
  const mutation = useSignOff(wardId);
  // One key per opening of the dialog: a double-click or a retry signs once.
  const idempotency = useIdempotencyKey();
  const drugs = useDrugs().data ?? [];
  const [refusals, setRefusals] = useState<string[]>([]);
  const incoming = role === 'incoming';
  const blocked = handoverConfirmRefusal(row.flags.open);
  const form = useForm<SignoffValues>({
    initialValues: { ...emptyPumpReading(), password: '' },
  });

  const submit = form.onSubmit((values) => {
    setRefusals([]);
    // Every problem at once: the reading's and the password's.
    const reading = incoming ? readPumpReading(values) : null;
    const errors: Record<string, string> = { ...reading?.errors, ...(values.password ? {} : { password: 'Enter your password to sign' }) };
    if (Object.keys(errors).length > 0 || (reading && !reading.settings)) {
      form.setErrors(errors);
      return;
    }
    mutation.mutate(
      {
        orderId: row.orderId,
        role,
        ...(reading?.settings ? { settings: reading.settings } : {}),
        signature: { password: values.password },
        idempotencyKey: idempotency.key,
      },
      {
        onSuccess: (signoff) => {
          notifySuccess('Handover signed', `${signoff.nurseName} signed as the ${role} nurse for ${row.patient.name}.`);
          onClose();
        },
        onError: (error) => {
          if (!isApiRequestError(error) || error.errors.length === 0) {
            setRefusals([isApiRequestError(error) ? error.message : 'Something went wrong. Try again.']);
            return;
          }
          const { fieldErrors, other } = signoffFormErrors(error.errors);
          form.setErrors(fieldErrors);
          // A pump that differs from the order: the overall words say what to do; each setting is named beside its field.
          const differs = error.errors.some((fieldError) => fieldError.field.startsWith('settings.'));
          setRefusals(differs ? [error.message, ...other] : other);
        },
      },
    );
  });

  const drugOptions = drugs.map((drug) => ({ value: String(drug.id), label: tallMan(drug.genericName) }));
  const unit = drugs.find((drug) => String(drug.id) === form.values.drugId)?.doseUnit ?? row.doseUnit;

  return (
    <Modal opened onClose={onClose} title={`Sign off (${role}): ${row.patient.name}`} size={incoming ? 'xl' : 'lg'}>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm">
            Bed {row.bed} · MRN {row.patient.mrn}.{' '}
            {incoming
              ? 'Read each setting off the pump and the syringe label and type it below. The order is not shown: Lockstep compares your reading with it.'
              : 'You confirm that you have handed this PCA over to the incoming nurse.'}
          </Text>
          {blocked ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Cannot be confirmed yet" role="alert">
              {blocked}
            </Alert>
          ) : null}
          {incoming ? (
            <Stack gap="sm">
              <Title order={3} size="h5">
                Your reading of the pump
              </Title>
              <Select
                label={PUMP_SETTING_LABELS.drugId}
                placeholder="Choose the drug on the pump"
                data={drugOptions}
                searchable
                allowDeselect={false}
                withAsterisk
                maw={320}
                {...form.getInputProps('drugId')}
              />
              <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="sm" verticalSpacing="sm">
                {PUMP_READING_FIELDS.map((field) => (
                  <NumberField
                    key={field}
                    label={`${PUMP_SETTING_LABELS[field]} (${pumpReadingUnit(field, unit)})`}
                    description={OPTIONAL_READING_FIELDS.includes(field) ? 'Empty if the pump has none' : undefined}
                    withAsterisk={!OPTIONAL_READING_FIELDS.includes(field)}
                    {...form.getInputProps(field)}
                  />
                ))}
              </SimpleGrid>
            </Stack>
          ) : (
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
          )}
          {refusals.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not signed" role="alert">
              {refusals.join(' ')}
            </Alert>
          ) : null}
          <SigningPasswordInput withAsterisk {...form.getInputProps('password')} />
          <Text size="xs" c="dimmed">
            {DECISION_SUPPORT_CAUTION}
          </Text>
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Back
            </Button>
            <Button type="submit" loading={mutation.isPending} disabled={blocked !== null} title={blocked ?? undefined}>
              Sign as {role} nurse
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
