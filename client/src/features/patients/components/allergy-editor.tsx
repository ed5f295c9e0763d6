import { useMemo, useState } from 'react';
import { ActionIcon, Alert, Button, Group, Paper, Select, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconPlus, IconTrash } from '@tabler/icons-react';
import { ALLERGY_SEVERITIES, ALLERGY_SEVERITY_LABELS, allergyStatus, tallMan, type Patient } from '@lockstep/shared';
import { useDrugs } from '@/api/drugs/get-drugs';
import { useAddAllergy } from '@/api/patients/add-allergy';
import { useRecordNoKnownAllergies } from '@/api/patients/record-no-known-allergies';
import { useRemoveAllergy } from '@/api/patients/remove-allergy';
import { AllergyList } from '@/components/ui/allergy-list';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { isApiRequestError } from '@/lib/api-error';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { allergyFormErrors, allergyRequest, EMPTY_ALLERGY_FORM, FREE_TEXT_SUBSTANCE, type AllergyFormValues } from '../utils/record-forms';

const SEVERITY_OPTIONS = [...ALLERGY_SEVERITIES]
  .reverse()
  .map((severity) => ({ value: severity, label: ALLERGY_SEVERITY_LABELS[severity] }));

/**
 * The patient's allergies on their page. Prescribers and pharmacists (`canEdit`) add an entry
 * (a formulary drug, or a substance typed as free text; the reaction; the severity), remove one
 * recorded in error, or record "no known allergies" when there are none. Every change is audited.
 */
export function AllergyEditor({ patient, canEdit }: { patient: Patient; canEdit: boolean }) {
  const drugs = useDrugs();
  const drugNames = useMemo(() => new Map((drugs.data ?? []).map((drug) => [drug.id, drug.genericName])), [drugs.data]);
  const add = useAddAllergy();
  const remove = useRemoveAllergy();
  const noneKnown = useRecordNoKnownAllergies();
  // One key for "no known allergies" until it is recorded: a double-click records it once.
  const noneKnownKey = useIdempotencyKey();
  const [key, setKey] = useState(() => crypto.randomUUID());
  const [refusal, setRefusal] = useState<string[]>([]);
  const form = useForm<AllergyFormValues>({
    initialValues: EMPTY_ALLERGY_FORM,
    validate: (values) => allergyFormErrors(values, drugNames),
  });
  const freeText = form.getValues().drug === FREE_TEXT_SUBSTANCE;

  const submit = form.onSubmit((values) => {
    setRefusal([]);
    add.mutate(
      { patientId: patient.id, allergy: allergyRequest(values, drugNames), idempotencyKey: key },
      {
        onSuccess: () => {
          notifySuccess('Allergy recorded', `${allergyRequest(values, drugNames).substance}: ${values.reaction}`);
          form.reset();
          setKey(crypto.randomUUID());
        },
        onError: (error) => {
          // The server names drugId; the form's field for it is `drug`.
          const drugError = isApiRequestError(error) ? error.errors.find((e) => e.field === 'drugId') : undefined;
          const others = applyServerErrors(form, error);
          if (drugError) form.setFieldError('drug', drugError.message);
          setRefusal(others.filter((message) => !drugError || message !== `drugId: ${drugError.message}`));
        },
      },
    );
  });

  const removeButton = (allergy: Patient['allergies'][number]) =>
    canEdit ? (
      <ActionIcon
        variant="subtle"
        color="gray"
        aria-label={`Remove ${allergy.substance} (recorded in error)`}
        loading={remove.isPending && remove.variables?.allergyId === allergy.id}
        onClick={() => remove.mutate({ patientId: patient.id, allergyId: allergy.id, idempotencyKey: crypto.randomUUID() })}
      >
        <IconTrash size={16} aria-hidden />
      </ActionIcon>
    ) : null;

  return (
    <Stack gap="sm" component="section" aria-labelledby="allergies-heading">
      <Title order={2} id="allergies-heading">
        Allergies
      </Title>
      <AllergyList patient={patient} action={removeButton} withRecorder />
      {remove.isError ? (
        <Alert color="red" icon={<IconAlertCircle size={16} aria-hidden />}>
          {remove.error.message}
        </Alert>
      ) : null}
      {canEdit && allergyStatus(patient) === 'not-recorded' ? (
        <Group gap="xs">
          <Button
            variant="default"
            size="xs"
            loading={noneKnown.isPending}
            onClick={() =>
              noneKnown.mutate({ patientId: patient.id, idempotencyKey: noneKnownKey.key }, { onSuccess: () => noneKnownKey.renew() })
            }
          >
            Record no known allergies
          </Button>
          {noneKnown.isError ? (
            <Text size="sm" c="red">
              {noneKnown.error.message}
            </Text>
          ) : null}
        </Group>
      ) : null}
      {canEdit ? (
        <Paper withBorder p="sm" radius="md">
          <form onSubmit={submit} noValidate aria-label="Record an allergy">
            <Stack gap="xs">
              <Group gap="sm" align="flex-start" wrap="wrap">
                <Select
                  label="Substance"
                  description="A formulary drug, or type another substance"
                  data={[
                    { value: FREE_TEXT_SUBSTANCE, label: 'Other (type it)' },
                    ...(drugs.data ?? []).map((drug) => ({ value: String(drug.id), label: tallMan(drug.genericName) })),
                  ]}
                  allowDeselect={false}
                  w={220}
                  {...form.getInputProps('drug')}
                />
                {freeText ? (
                  <TextInput label="Substance (free text)" withAsterisk w={220} maxLength={120} {...form.getInputProps('substance')} />
                ) : null}
                <TextInput
                  label="Reaction"
                  withAsterisk
                  w={220}
                  maxLength={200}
                  placeholder="e.g. hives, or not known"
                  {...form.getInputProps('reaction')}
                />
                <Select
                  label="Severity"
                  withAsterisk
                  data={SEVERITY_OPTIONS}
                  w={160}
                  placeholder="Choose"
                  {...form.getInputProps('severity')}
                />
              </Group>
              {refusal.length > 0 ? (
                <Alert color="red" icon={<IconAlertCircle size={16} aria-hidden />}>
                  {refusal.join(' ')}
                </Alert>
              ) : null}
              <Group>
                <Button type="submit" size="xs" leftSection={<IconPlus size={14} aria-hidden />} loading={add.isPending}>
                  Record allergy
                </Button>
              </Group>
            </Stack>
          </form>
        </Paper>
      ) : null}
    </Stack>
  );
}
