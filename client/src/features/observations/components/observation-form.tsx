import { useState } from 'react';
import { Alert, Button, Group, Paper, Select, SimpleGrid, Stack, Textarea, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconDeviceFloppy } from '@tabler/icons-react';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { formatDateTime } from '@/utils/format-date';
import { useRecordObservation } from '@/api/orders/record-observation';
import { formatClock } from '@/utils/clock';
import {
  emptyObservationForm,
  NUMBER_FIELDS,
  OPTIONAL_NUMBER_FIELDS,
  pumpBounds,
  readLocalDateTime,
  toObservationRequest,
  validateObservationForm,
  type ObservationFormValues,
} from '../utils/observation-form';
import { usePatient } from '@/api/patients/get-patient';
import { useWards } from '@/api/wards/get-wards';
import { deliveryWarning } from '../utils/delivery-warning';
import { fieldWarnings, observationFindings, vitalsPatientFor } from '../utils/observation-warnings';
import { ObservationFindings } from './observation-findings';
import { ObservationNumberInput } from './observation-number-input';
import { SedationField } from './sedation-field';
import {
  CONSCIOUSNESS_LABELS,
  CONSCIOUSNESS_LEVELS,
  OXYGEN_DEVICE_LABELS,
  OXYGEN_DEVICES,
  type PumpTotalField,
  type WardPolicy,
  type ObservationResponse,
  type OrderDetail,
  type RecordedObservation,
} from '@lockstep/shared';

const DEVICE_OPTIONS = OXYGEN_DEVICES.map((value) => ({ value, label: OXYGEN_DEVICE_LABELS[value] }));
const CONSCIOUSNESS_OPTIONS = CONSCIOUSNESS_LEVELS.map((value) => ({ value, label: CONSCIOUSNESS_LABELS[value] }));

export interface ObservationFormProps {
  order: OrderDetail;
  observations: readonly ObservationResponse[];
  /** The ward's policy, to say before saving what the observation will raise (the defaults until it is loaded). */
  thresholds: WardPolicy | undefined;
  onSaved: (observation: RecordedObservation) => void;
}

// Sedation and breathing are assessed before the patient is woken to be asked about pain.
const FOCUS_ORDER: readonly (keyof ObservationFormValues)[] = [
  'sedationLevel',
  'respiratoryRate',
  'spo2',
  'oxygenLitresPerMinute',
  'oxygenDevice',
  'consciousness',
  'heartRate',
  'systolicBp',
  'temperatureC',
  'painScore',
  'attempts',
  'delivered',
  'volumeInfusedMl',
  'syringeRemainingMl',
  'at',
  'note',
];

const PUMP_LABELS: Record<PumpTotalField, string> = {
  attempts: 'Attempts',
  delivered: 'Delivered',
  volumeInfusedMl: 'Volume infused (mL)',
};

/** The typed time said back in words, so day and month can never be read the wrong way round. */
function observedAtHint(value: string): string {
  const at = readLocalDateTime(value.trim());
  return at ? `Observed ${formatDateTime(at.toISOString())}` : 'Leave empty for now; never later than now';
}

function focusField(field: keyof ObservationFormValues) {
  const id = field === 'sedationLevel' ? 'observation-sedation-S' : `observation-${field}`;
  document.getElementById(id)?.focus();
}

/** An observation, typed fast: large boxes in the order they are taken, checked as they are typed. */
export function ObservationForm({ order, observations, thresholds, onSaved }: ObservationFormProps) {
  const record = useRecordObservation();
  // One key per observation: a double-click or a retry saves it once; the next one gets a new key.
  const idempotency = useIdempotencyKey();
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const running = order.releases.find((release) => release.status === 'in_use') ?? null;

  const form = useForm<ObservationFormValues>({
    initialValues: emptyObservationForm(),
    // Read at every check (the form uses this render's rules), so the latest observations count.
    validate: (values) => validateObservationForm(values, { observations, release: running, startedAt: order.startedAt, now: new Date() }),
    validateInputOnChange: [...NUMBER_FIELDS, ...OPTIONAL_NUMBER_FIELDS, 'at'],
  });
  // Who the bands are for: the patient's age and SpO2 scale, and the ward's population.
  const patient = usePatient(order.patientId).data;
  const ward = useWards().data?.find((candidate) => candidate.id === order.wardId);
  const now = new Date();
  const findings = observationFindings(form.values, {
    order,
    observations,
    policy: thresholds,
    patient: patient && ward ? vitalsPatientFor(patient, ward, now) : undefined,
    now,
  });
  const warnings = fieldWarnings(findings);
  // The doses typed against the lockout and limits as soon as Delivered is typed, before the rest.
  const earlyDelivered = deliveryWarning(form.values, order, observations, now);
  const deliveredWarning = warnings.delivered ?? (earlyDelivered ? { severity: 'urgent' as const, text: earlyDelivered } : undefined);
  const { floor } = pumpBounds(observations, running?.id ?? null, new Date());
  const pumpHint = (field: PumpTotalField) => (floor ? `At least ${floor[field]} (at ${formatClock(floor.at)})` : 'New syringe: from 0');

  const submit = form.onSubmit(
    (values) => {
      setFormAlert([]);
      record.mutate(
        { orderId: order.id, observation: toObservationRequest(values), idempotencyKey: idempotency.key },
        {
          onSuccess: (saved) => {
            idempotency.renew();
            onSaved(saved);
          },
          onError: (error) => setFormAlert(applyServerErrors(form, error)),
        },
      );
    },
    (errors) => {
      const first = FOCUS_ORDER.find((field) => errors[field]);
      if (first) focusField(first);
    },
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Observation">
      <Stack gap="lg">
        {formAlert.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The observation was not saved" role="alert">
            {formAlert.join(' ')}
          </Alert>
        ) : null}
        <Paper withBorder radius="md" p="lg" component="fieldset" m={0}>
          <Title order={2} component="legend" fz="h3" px={4}>
            1. The patient
          </Title>
          <Stack gap="lg">
            <SedationField
              value={form.values.sedationLevel}
              onChange={(level) => form.setFieldValue('sedationLevel', level)}
              error={form.errors.sedationLevel}
              warning={warnings.sedationLevel?.action}
            />
            <SimpleGrid cols={{ base: 1, sm: 3 }} spacing="lg">
              <ObservationNumberInput
                field="respiratoryRate"
                label="Respiratory rate (/min)"
                description="Breaths per minute, counted for a full minute"
                warning={warnings.respiratoryRate}
                inputProps={form.getInputProps('respiratoryRate')}
              />
              <ObservationNumberInput
                field="spo2"
                label="SpO2 (%)"
                description="0 to 100"
                warning={warnings.spo2}
                inputProps={form.getInputProps('spo2')}
              />
              <ObservationNumberInput
                field="oxygenLitresPerMinute"
                label="Oxygen (L/min)"
                description="0 for air: oxygen keeps the SpO2 up while breathing slows"
                inputProps={form.getInputProps('oxygenLitresPerMinute')}
              />
              <Select
                id="observation-oxygenDevice"
                label="Oxygen device"
                description="When oxygen is running"
                placeholder="Air: none"
                size="lg"
                data={DEVICE_OPTIONS}
                clearable
                value={form.values.oxygenDevice || null}
                onChange={(value) => form.setFieldValue('oxygenDevice', value ?? '')}
                error={form.errors.oxygenDevice}
              />
              <Select
                id="observation-consciousness"
                label="Consciousness"
                description="Optional: alert, new confusion, voice, pain, unresponsive"
                placeholder="Not recorded"
                size="lg"
                data={CONSCIOUSNESS_OPTIONS}
                clearable
                value={form.values.consciousness || null}
                onChange={(value) => form.setFieldValue('consciousness', value ?? '')}
                error={form.errors.consciousness}
              />
              <ObservationNumberInput
                field="heartRate"
                label="Heart rate (/min)"
                description="Optional"
                warning={warnings.heartRate}
                inputProps={form.getInputProps('heartRate')}
              />
              <ObservationNumberInput
                field="systolicBp"
                label="Systolic BP (mmHg)"
                description="Optional"
                inputProps={form.getInputProps('systolicBp')}
              />
              <ObservationNumberInput
                field="temperatureC"
                label="Temperature (°C)"
                description="Optional"
                inputProps={form.getInputProps('temperatureC')}
              />
              <ObservationNumberInput
                field="painScore"
                label="Pain score (0–10)"
                description="0 no pain, 10 worst imaginable"
                warning={warnings.painScore}
                inputProps={form.getInputProps('painScore')}
              />
            </SimpleGrid>
          </Stack>
        </Paper>
        <Paper withBorder radius="md" p="lg" component="fieldset" m={0}>
          <Title order={2} component="legend" fz="h3" px={4}>
            2. The pump and syringe
          </Title>
          <SimpleGrid cols={{ base: 1, sm: 2, lg: 4 }} spacing="lg">
            {(['attempts', 'delivered', 'volumeInfusedMl'] as const).map((field) => (
              <ObservationNumberInput
                key={field}
                field={field}
                label={PUMP_LABELS[field]}
                description={pumpHint(field)}
                warning={field === 'delivered' ? deliveredWarning : undefined}
                inputProps={form.getInputProps(field)}
              />
            ))}
            <ObservationNumberInput
              field="syringeRemainingMl"
              label="Syringe left (mL)"
              description={running ? `Of the ${running.volumeMl} mL syringe` : 'Read off the syringe'}
              warning={warnings.syringeRemainingMl}
              inputProps={form.getInputProps('syringeRemainingMl')}
            />
          </SimpleGrid>
        </Paper>
        <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="lg">
          <TextInput
            id="observation-at"
            type="datetime-local"
            label="Time observed"
            description={observedAtHint(form.values.at)}
            size="lg"
            {...form.getInputProps('at')}
          />
          <Textarea
            id="observation-note"
            label="Note"
            description="Optional"
            size="lg"
            autosize
            minRows={1}
            maxRows={4}
            {...form.getInputProps('note')}
          />
        </SimpleGrid>
        <ObservationFindings findings={findings} />
        <Group justify="flex-end">
          <Button type="submit" size="lg" loading={record.isPending} leftSection={<IconDeviceFloppy size={22} aria-hidden />}>
            Save observation
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
