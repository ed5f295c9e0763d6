import { useState } from 'react';
import { Alert, Button, Group, Paper, Stack, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconDeviceFloppy } from '@tabler/icons-react';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import type { WardPolicySettings } from '@lockstep/shared';
import { useUpdateWardPolicy } from '@/api/wards/update-ward-policy';
import {
  POLICY_EMAIL_FIELDS,
  POLICY_NUMBER_FIELDS,
  policyChanges,
  policyToForm,
  validatePolicyForm,
  type PolicyFormValues,
  type PolicyGroup,
} from '../utils/policy-form';
import { PolicyNumberInput } from './policy-number-input';

const GROUP_TITLES: Record<PolicyGroup, string> = {
  intervals: 'Observation intervals',
  escalation: 'Escalation thresholds',
  syringe: 'Syringe and reconciliation',
  weight: 'Weight for dosing',
};

export interface WardPolicyFormProps {
  wardId: number;
  wardName: string;
  policy: WardPolicySettings;
}

/** Every policy value of one ward, checked as typed; Save sends only what changed. */
export function WardPolicyForm({ wardId, wardName, policy }: WardPolicyFormProps) {
  const update = useUpdateWardPolicy();
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const form = useForm<PolicyFormValues>({
    initialValues: policyToForm(policy),
    validate: validatePolicyForm,
    validateInputOnChange: true,
  });
  const changes = policyChanges(form.values, policy);
  const changed = Object.keys(changes).length > 0;

  const submit = form.onSubmit((values) => {
    setFormAlert([]);
    update.mutate(
      { wardId, changes: policyChanges(values, policy) },
      {
        onSuccess: (saved) => {
          form.setInitialValues(policyToForm(saved));
          form.setValues(policyToForm(saved));
          notifySuccess('Ward policy saved', `${wardName}: the new values apply from the next observation.`);
        },
        onError: (error) => setFormAlert(applyServerErrors(form, error)),
      },
    );
  });

  return (
    <form onSubmit={submit} noValidate aria-label={`${wardName} ward policy`}>
      <Stack gap="lg">
        {formAlert.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The policy was not saved" role="alert">
            {formAlert.join(' ')}
          </Alert>
        ) : null}
        {(Object.keys(GROUP_TITLES) as PolicyGroup[]).map((group) => (
          <Paper key={group} withBorder radius="md" p="md" component="fieldset" m={0}>
            <Title order={2} component="legend" fz="h3" px={4}>
              {GROUP_TITLES[group]}
            </Title>
            <Stack gap="md">
              {POLICY_NUMBER_FIELDS.filter((field) => field.group === group).map((field) => (
                <PolicyNumberInput
                  key={field.key}
                  field={field}
                  savedValue={policy[field.key]}
                  inputProps={form.getInputProps(field.key)}
                />
              ))}
            </Stack>
          </Paper>
        ))}
        <Paper withBorder radius="md" p="md" component="fieldset" m={0}>
          <Title order={2} component="legend" fz="h3" px={4}>
            E-mail addresses
          </Title>
          <Stack gap="md">
            {POLICY_EMAIL_FIELDS.map((field) => (
              <TextInput
                key={field.key}
                id={`policy-${field.key}`}
                type="email"
                label={`${field.label} e-mail`}
                description={`${field.help}. Leave empty for none.`}
                autoComplete="off"
                maw={560}
                {...form.getInputProps(field.key)}
              />
            ))}
          </Stack>
        </Paper>
        <Group>
          <Button type="submit" loading={update.isPending} disabled={!changed} leftSection={<IconDeviceFloppy size={18} aria-hidden />}>
            Save
          </Button>
          <Button
            variant="default"
            disabled={!changed}
            onClick={() => {
              form.reset();
              setFormAlert([]);
            }}
          >
            Undo changes
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
