import { useState, type FormEvent } from 'react';
import { Alert, Button, Group, Paper, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconDeviceFloppy, IconSignature } from '@tabler/icons-react';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import type { WardPolicyChange, WardPolicySettings } from '@lockstep/shared';
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
import { proposeBlock, splitPolicyChanges } from '../utils/policy-change';
import { PolicyNumberInput } from './policy-number-input';
import { ProposeChangeModal } from './propose-change-modal';

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
  /** The change waiting on this ward for sign-off: another cannot be proposed until it is decided. */
  pending: WardPolicyChange | null;
}

/**
 * Every policy value of one ward, checked as typed. The clinical settings change by a signed proposal that a
 * charge nurse or pharmacist signs off; the e-mail addresses the admin saves directly.
 */
export function WardPolicyForm({ wardId, wardName, policy, pending }: WardPolicyFormProps) {
  const update = useUpdateWardPolicy();
  // One key per save of the addresses: a double-click or a retry saves once; renewed after it is saved.
  const emailsKey = useIdempotencyKey();
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const [proposing, setProposing] = useState(false);
  const form = useForm<PolicyFormValues>({
    initialValues: policyToForm(policy),
    validate: validatePolicyForm,
    validateInputOnChange: true,
  });
  const { settings, emails } = splitPolicyChanges(policyChanges(form.values, policy));
  const settingsChanged = Object.keys(settings).length > 0;
  const emailsChanged = Object.keys(emails).length > 0;
  const blocked = proposeBlock(pending);

  /** Checks only the given fields; true when they are all valid. */
  const valid = (keys: readonly (keyof PolicyFormValues)[]) => keys.map((key) => form.validateField(key).hasError).every((error) => !error);

  // The settings alone are checked before the proposal opens: an e-mail address being typed does not hold it up.
  const propose = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setFormAlert([]);
    // Enter in an e-mail field submits too: there is nothing to propose then.
    if (!settingsChanged || blocked) return;
    if (valid(POLICY_NUMBER_FIELDS.map((field) => field.key))) setProposing(true);
  };

  const saveEmails = () => {
    setFormAlert([]);
    if (!valid(POLICY_EMAIL_FIELDS.map((field) => field.key))) return;
    update.mutate(
      { wardId, changes: emails, idempotencyKey: emailsKey.key },
      {
        onSuccess: (saved) => {
          emailsKey.renew();
          // Only the addresses are saved: any setting being edited stays as typed.
          form.setInitialValues(policyToForm(saved));
          for (const { key } of POLICY_EMAIL_FIELDS) form.setFieldValue(key, saved[key]);
          notifySuccess('E-mail addresses saved', `${wardName}: flags and notices go to the new addresses.`);
        },
        onError: (error) => setFormAlert(applyServerErrors(form, error)),
      },
    );
  };

  return (
    <>
      <form onSubmit={propose} noValidate aria-label={`${wardName} ward policy`}>
        <Stack gap="lg">
          {formAlert.length > 0 ? (
            <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="Not saved" role="alert">
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
          {blocked ? (
            <Text size="sm" c="dimmed" id="propose-blocked">
              {blocked}
            </Text>
          ) : null}
          <Group>
            <Button
              type="submit"
              disabled={!settingsChanged || blocked !== null}
              aria-describedby={blocked ? 'propose-blocked' : undefined}
              leftSection={<IconSignature size={18} aria-hidden />}
            >
              Propose change
            </Button>
            <Button
              variant="default"
              loading={update.isPending}
              disabled={!emailsChanged}
              onClick={saveEmails}
              leftSection={<IconDeviceFloppy size={18} aria-hidden />}
            >
              Save e-mail addresses
            </Button>
            <Button
              variant="subtle"
              disabled={!settingsChanged && !emailsChanged}
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
      {proposing ? (
        <ProposeChangeModal
          wardId={wardId}
          wardName={wardName}
          settings={settings}
          saved={policy}
          onSettingErrors={(errors) => form.setErrors(errors)}
          onProposed={() => {
            setProposing(false);
            // Nothing changes until the sign-off: the form goes back to the ward's current values, the change shows above it.
            form.setValues(policyToForm(policy));
            form.resetDirty();
            notifySuccess('Change proposed', `${wardName}: it applies once a charge nurse or pharmacist signs it off.`);
          }}
          onClose={() => setProposing(false)}
        />
      ) : null}
    </>
  );
}
