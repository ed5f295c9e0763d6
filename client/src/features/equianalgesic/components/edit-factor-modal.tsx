import { SigningPasswordInput } from '@/components/dialogs/signing-password-input';
import { useState } from 'react';
import { Alert, Button, Group, Modal, Select, Stack, Text, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconSignature } from '@tabler/icons-react';
import { DOSE_UNITS, EQUIANALGESIC_SOURCE_MAX_LENGTH, tallMan, type DoseUnit } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import { isSignatureError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';
import { readNumber } from '@/lib/number-input';
import { notifySuccess } from '@/lib/notify';
import { useUpdateEquianalgesicFactor } from '../api/update-equianalgesic-factor';
import { describeFactor } from '../utils/factor-display';
import { factorFormErrors, factorFormValues, type FactorFormValues, type FactorTarget } from '../utils/factor-form';

export interface EditFactorModalProps {
  factor: FactorTarget;
  onClose: () => void;
}

/** A pharmacist's change to one factor: amount, unit and its source, signed with their password. */
export function EditFactorModal({ factor, onClose }: EditFactorModalProps) {
  const update = useUpdateEquianalgesicFactor();
  // One key for this change: sending it again (a retry after a dropped answer) records it once.
  const [idempotencyKey] = useState(() => crypto.randomUUID());
  const [refusal, setRefusal] = useState<string[]>([]);
  const form = useForm<FactorFormValues>({ initialValues: factorFormValues(factor), validate: factorFormErrors });
  const route = factor.route;

  const submit = form.onSubmit((values) => {
    setRefusal([]);
    update.mutate(
      {
        drugId: factor.drugId,
        route: factor.route,
        amount: readNumber(values.amount) ?? Number.NaN,
        unit: values.unit,
        source: values.source.trim(),
        password: values.password,
        idempotencyKey,
      },
      {
        onSuccess: (saved) => {
          notifySuccess('Factor saved', describeFactor(saved));
          onClose();
        },
        onError: (error) => {
          form.setFieldValue('password', '');
          if (isSignatureError(error)) {
            form.setFieldError('password', error instanceof Error ? error.message : 'The password you signed with is not correct');
            return;
          }
          setRefusal(applyServerErrors(form, error));
        },
      },
    );
  });

  return (
    <Modal
      opened
      onClose={onClose}
      title={`${factor.amount === undefined ? 'Set' : 'Change'} ${tallMan(factor.genericName)} (${route})`}
      size="lg"
    >
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm">
            The amount of {tallMan(factor.genericName)}, given {route === 'oral' ? 'by mouth' : 'parenterally'}, taken as equal to 10 mg
            parenteral morphine. Every oral-morphine figure for this drug uses it from the moment you sign. Name the published source that
            states it: tables vary.
          </Text>
          {refusal.length > 0 ? (
            <Alert color="red" icon={<IconAlertCircle aria-hidden />} title="Not saved">
              {refusal.join(' ')}
            </Alert>
          ) : null}
          <Group align="flex-start" grow>
            <NumberField label="Amount" {...form.getInputProps('amount')} />
            <Select
              label="Unit"
              data={DOSE_UNITS.map((unit) => ({ value: unit, label: unit }))}
              allowDeselect={false}
              withAsterisk
              {...form.getInputProps('unit')}
              onChange={(value) => value && form.setFieldValue('unit', value as DoseUnit)}
            />
          </Group>
          <Textarea
            label="Source"
            description="Title, organisation or authors, and year"
            autosize
            minRows={2}
            maxLength={EQUIANALGESIC_SOURCE_MAX_LENGTH}
            withAsterisk
            {...form.getInputProps('source')}
          />
          <SigningPasswordInput description="Type your password again to sign the change" {...form.getInputProps('password')} />
          <Group justify="flex-end">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={update.isPending} leftSection={<IconSignature size={16} aria-hidden />}>
              Sign and save
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
