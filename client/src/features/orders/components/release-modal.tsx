import { useState } from 'react';
import { Alert, Button, Group, Modal, SimpleGrid, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconPackageExport } from '@tabler/icons-react';
import {
  DECISION_SUPPORT_CAUTION,
  formatDose,
  MIN_REASON_LENGTH,
  openReleases,
  RELEASE_STATUS_LABELS,
  USUAL_SYRINGE_ML,
  type OrderDetail,
  type OrderSummary,
  type SyringeReleaseResponse,
} from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateRelease } from '@/api/orders/create-release';
import { readAmount } from '../utils/order-form';
import { isUnusualVolume, readReleaseForm, releaseFormValues, type ReleaseFormValues } from '../utils/release-form';
import { OrderInBrief } from './order-in-brief';
import { ReleaseResult } from './release-result';

export interface ReleaseModalProps {
  /** With its releases when known (the order's detail), so an open syringe is named before sending. */
  order: OrderSummary & Partial<Pick<OrderDetail, 'releases'>>;
  onClose: () => void;
}

/** Pharmacy releases a labelled syringe of the order's concentration, then prints its label. */
export function ReleaseModal({ order, onClose }: ReleaseModalProps) {
  const release = useCreateRelease();
  // One key per opening of the dialog: a double-click or a retry releases one syringe.
  const idempotency = useIdempotencyKey();
  const [released, setReleased] = useState<SyringeReleaseResponse | null>(null);
  const [formAlert, setFormAlert] = useState<string[]>([]);
  // The server's 409 for a second syringe this screen did not know of: shown beside the reason field.
  const [serverRefusal, setServerRefusal] = useState<string | null>(null);
  const open = openReleases(order.releases ?? []);
  const asksSecondReason = open.length > 0 || serverRefusal !== null;
  const form = useForm<ReleaseFormValues>({ initialValues: releaseFormValues(order) });
  const unit = order.doseUnit;
  const volume = readAmount(form.values.volumeMl);
  const concentration = readAmount(form.values.concentrationPerMl);
  const unusual = isUnusualVolume(volume);
  const total = volume !== null && concentration !== null ? formatDose(volume * concentration, unit) : null;

  const submit = form.onSubmit((values) => {
    setFormAlert([]);
    const { request, errors } = readReleaseForm(values, new Date(), order.releases ?? [], serverRefusal);
    if (!request) {
      form.setErrors(errors);
      return;
    }
    release.mutate(
      { orderId: order.id, request, idempotencyKey: idempotency.key },
      {
        onSuccess: (answer) => {
          idempotency.renew();
          setReleased(answer);
        },
        onError: (error) => {
          if (isApiRequestError(error) && error.status === 409 && error.message.includes('give a reason to release a second')) {
            setServerRefusal(error.message);
            form.setFieldError('secondSyringeReason', error.message);
            return;
          }
          setFormAlert(isApiRequestError(error) && error.status === 400 ? applyServerErrors(form, error) : [errorMessage(error)]);
        },
      },
    );
  });

  if (released) {
    return (
      <Modal opened onClose={onClose} title="Syringe released" size="lg">
        <ReleaseResult release={released} onDone={onClose} />
      </Modal>
    );
  }

  return (
    <Modal opened onClose={onClose} title={`Release a syringe for order ${order.id}`} size="lg">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <div>
            <OrderInBrief order={order} />
          </div>
          {formAlert.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not released" role="alert">
              {formAlert.join(' ')}
            </Alert>
          ) : null}
          <SimpleGrid cols={{ base: 1, sm: 2 }} spacing="md">
            <TextInput
              label="Concentration"
              description={`Must match the order: ${formatDose(order.concentrationPerMl, `${unit}/mL`)}`}
              rightSection={<Text size="sm" c="dimmed">{`${unit}/mL`}</Text>}
              rightSectionWidth={70}
              inputMode="decimal"
              size="md"
              withAsterisk
              {...form.getInputProps('concentrationPerMl')}
            />
            <TextInput
              label="Volume"
              description={
                total
                  ? `Holds ${total} in ${formatDose(volume ?? Number.NaN, 'mL')}`
                  : `Usually ${USUAL_SYRINGE_ML.min}–${USUAL_SYRINGE_ML.max} mL`
              }
              rightSection={
                <Text size="sm" c="dimmed">
                  mL
                </Text>
              }
              inputMode="decimal"
              size="md"
              withAsterisk
              {...form.getInputProps('volumeMl')}
            />
            <TextInput label="Batch" size="md" withAsterisk autoComplete="off" {...form.getInputProps('batch')} />
            <TextInput
              label="Expiry"
              description="Date and time"
              type="datetime-local"
              size="md"
              withAsterisk
              {...form.getInputProps('expiresAt')}
            />
            <TextInput label="Prepared by" size="md" withAsterisk autoComplete="off" {...form.getInputProps('preparedBy')} />
            <TextInput label="Checked by" size="md" withAsterisk autoComplete="off" {...form.getInputProps('checkedBy')} />
          </SimpleGrid>
          {open.length > 0 ? (
            <Alert color="yellow" variant="light" icon={<IconAlertCircle aria-hidden />} title="This order already has a syringe">
              {open
                .map(
                  (syringe) =>
                    `${syringe.releaseCode} (${RELEASE_STATUS_LABELS[syringe.status].toLowerCase()}, ${formatDose(syringe.volumeMl, 'mL')})`,
                )
                .join(', ')}
              . One ready or running syringe per order: give the reason for a second one.
            </Alert>
          ) : null}
          {asksSecondReason ? (
            <Textarea
              label="Reason for a second syringe"
              description={`The order already has a ready or running syringe; at least ${MIN_REASON_LENGTH} characters`}
              autosize
              minRows={2}
              size="md"
              withAsterisk
              {...form.getInputProps('secondSyringeReason')}
            />
          ) : null}
          {unusual ? (
            <Textarea
              label="Reason for the unusual volume"
              description={`Outside the usual ${USUAL_SYRINGE_ML.min}–${USUAL_SYRINGE_ML.max} mL; at least ${MIN_REASON_LENGTH} characters`}
              autosize
              minRows={2}
              size="md"
              withAsterisk
              {...form.getInputProps('overrideReason')}
            />
          ) : null}
          <Text size="xs" c="dimmed">
            {DECISION_SUPPORT_CAUTION}
          </Text>
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Back
            </Button>
            <Button type="submit" leftSection={<IconPackageExport size={16} aria-hidden />} loading={release.isPending}>
              Release syringe
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
