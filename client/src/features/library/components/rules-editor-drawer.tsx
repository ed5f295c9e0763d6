import { useRef, useState } from 'react';
import { Alert, Button, Drawer, Group, List, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconDeviceFloppy, IconPlus } from '@tabler/icons-react';
import type { Drug, LibraryVersionDetail } from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useReplaceRules } from '@/api/library/replace-rules';
import { emptyRuleForm, placeRuleErrors, readRulesForm, ruleToForm, type RulesFormValues } from '../utils/rule-form';
import { RuleFieldset } from './rule-fieldset';

export interface RulesEditorDrawerProps {
  opened: boolean;
  onClose: () => void;
  version: LibraryVersionDetail;
  drugs: Drug[];
  weightBased: boolean;
}

export function RulesEditorDrawer({ opened, onClose, version, ...props }: RulesEditorDrawerProps) {
  return (
    <Drawer
      opened={opened}
      onClose={onClose}
      position="right"
      size={1000}
      title={`Edit rules: ${version.wardName} version ${version.number}`}
    >
      {/* Mounted only while open, so each opening starts from the saved rules. */}
      {opened ? <RulesEditorForm version={version} onClose={onClose} {...props} /> : null}
    </Drawer>
  );
}

type RulesEditorFormProps = Omit<RulesEditorDrawerProps, 'opened'>;

function RulesEditorForm({ version, drugs, weightBased, onClose }: RulesEditorFormProps) {
  const replaceRules = useReplaceRules();
  // One key per opening of the editor: a double-click or a retry saves the rules once.
  const idempotency = useIdempotencyKey();
  const [alerts, setAlerts] = useState<string[]>([]);
  const newKeys = useRef(0);
  const form = useForm<RulesFormValues>({
    initialValues: { rules: version.rules.map((rule) => ruleToForm(rule, `rule-${rule.id}`)) },
    // The same checks the server makes, with the same paths, so each lands beside its input.
    validate: (values) => readRulesForm(values, drugs).errors,
  });

  const addRule = () => {
    newKeys.current += 1;
    form.insertListItem('rules', emptyRuleForm(`new-${newKeys.current}`, weightBased));
  };

  const save = form.onSubmit(
    (values) => {
      setAlerts([]);
      const { rules } = readRulesForm(values, drugs);
      replaceRules.mutate(
        { versionId: version.id, rules, idempotencyKey: idempotency.key },
        {
          onSuccess: (saved) => {
            idempotency.renew();
            notifySuccess(
              'Rules saved',
              `Draft version ${saved.number} now has ${saved.ruleCount} ${saved.ruleCount === 1 ? 'rule' : 'rules'}.`,
            );
            onClose();
          },
          onError: (error) => {
            if (isApiRequestError(error) && error.status === 400 && error.errors.length > 0) {
              const placed = placeRuleErrors(error.errors, values.rules.length);
              form.setErrors(placed.fieldErrors);
              setAlerts([error.message, ...placed.otherErrors]);
            } else setAlerts([errorMessage(error)]);
          },
        },
      );
    },
    (errors) => {
      const count = Object.keys(errors).length;
      setAlerts([`${count} ${count === 1 ? 'entry needs' : 'entries need'} correcting; each is marked beside its field.`]);
    },
  );

  return (
    <form onSubmit={save} noValidate>
      <Stack gap="md">
        <Text size="sm" c="dimmed">
          Leave a limit empty where it is not checked. Limits must run hard min ≤ soft min ≤ soft max ≤ hard max; a value equal to a limit
          is inside it.
        </Text>
        {alerts.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The rules were not saved" role="alert">
            <List size="sm">
              {alerts.map((alert) => (
                <List.Item key={alert}>{alert}</List.Item>
              ))}
            </List>
          </Alert>
        ) : null}
        {form.values.rules.map((rule, index) => (
          <RuleFieldset key={rule.key} form={form} index={index} drugs={drugs} />
        ))}
        {form.values.rules.length === 0 ? <Text size="sm">This draft has no rules. Add one to start.</Text> : null}
        <Group>
          <Button variant="default" leftSection={<IconPlus size={16} aria-hidden />} onClick={addRule}>
            Add rule
          </Button>
        </Group>
        <Group
          justify="flex-end"
          pos="sticky"
          bottom={0}
          py="sm"
          bg="var(--mantine-color-body)"
          style={{ zIndex: 1, borderTop: '1px solid var(--mantine-color-default-border)' }}
        >
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" leftSection={<IconDeviceFloppy size={16} aria-hidden />} loading={replaceRules.isPending}>
            Save rules
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
