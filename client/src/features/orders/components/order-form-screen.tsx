import { useMemo, useState, type ReactNode } from 'react';
import { Alert, Button, Grid, Group, Paper, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle, IconArrowBackUp, IconSignature } from '@tabler/icons-react';
import { OpenPcaAlert } from './open-pca-alert';
import { useNavigate } from 'react-router-dom';
import {
  blockingFindings,
  type CreateOrderRequest,
  type Finding,
  type LimitRuleResponse,
  type OrderDetail,
  type Patient,
  patientFactorsOf,
  REGIMEN_FIELDS,
  softFindingFields,
} from '@lockstep/shared';
import { paths } from '@/config/paths';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useOrderCheck } from '../hooks/use-order-check';
import { orderRequest, placeOrderErrors, unsignedOrderErrors } from '../utils/order-errors';
import { emptyOrderForm, valuesFromOrder, type OrderFormValues } from '../utils/order-form';
import { availableOrderSets, prefillFromSet, type AvailableOrderSet } from '../utils/order-sets';
import { pickableRules } from '../utils/rule-for-patient';
import { DrugSection } from './drug-section';
import { FindingReasons } from './finding-reasons';
import { OrderCheckPanel } from './order-check-panel';
import { RegimenSection } from './regimen-section';
import { SignOrderModal } from './sign-order-modal';

export interface OrderFormScreenProps {
  patient: Patient;
  /** The rules of the patient's ward's active dose-limit library. */
  rules: LimitRuleResponse[];
  weightBasedWard: boolean;
  /** The patient's identity and risk factors, shown above the form. */
  patientBanner: ReactNode;
  /** A returned order: the form starts from it and signing makes a new version. */
  revising?: OrderDetail;
}

const RULE_FINDING_FIELDS = ['concentrationPerMl', 'doseUnit', 'drugId'];

/** New PCA order (or the revision of a returned one), with the live check beside it. */
export function OrderFormScreen({ patient, rules, weightBasedWard, patientBanner, revising }: OrderFormScreenProps) {
  const navigate = useNavigate();
  const [today] = useState(() => new Date());
  // One choice per drug and concentration; the check chooses the rule by the patient (shared chooseRule).
  const pickable = useMemo(() => pickableRules(rules, patientFactorsOf(patient, today)), [rules, patient, today]);
  const form = useForm<OrderFormValues>({
    initialValues: revising ? valuesFromOrder(revising, pickable, today) : emptyOrderForm(today),
  });
  const [attempted, setAttempted] = useState(false);
  const [formAlert, setFormAlert] = useState<string[]>([]);
  const [unsigned, setUnsigned] = useState<Omit<CreateOrderRequest, 'signature'> | null>(null);
  // One key per opening of the order form, kept across signing attempts: a double-click or a
  // retry after a lost answer signs one order.
  const idempotency = useIdempotencyKey();

  const rule = pickable.find((candidate) => String(candidate.id) === form.values.ruleId) ?? null;
  const check = useOrderCheck(form.values, rule, patient, rules, revising?.id);
  const regimenSoft = softFindingFields(check.findings);
  // Soft findings about something other than a regimen value (a recorded allergy on drugId, the weight) need a reason too.
  const otherSoftFindings = check.findings.filter(
    (finding) => finding.severity === 'soft' && !(REGIMEN_FIELDS as readonly string[]).includes(finding.field),
  );
  const soft = [...regimenSoft, ...new Set(otherSoftFindings.map((finding) => finding.field))];
  const blocking = blockingFindings(check.findings);
  const sets = useMemo(() => availableOrderSets(pickable, weightBasedWard), [pickable, weightBasedWard]);
  const showFinding = (finding: Finding) => finding.code !== 'number.missing' || attempted || form.isTouched(finding.field);

  const pickSet = ({ set, rule: setRule }: AvailableOrderSet) => {
    const prefill = prefillFromSet(set, setRule, patient.weightKg);
    if (!prefill) return;
    form.setValues(prefill);
    form.clearErrors();
    setFormAlert([]);
  };

  const startSigning = form.onSubmit((values) => {
    setAttempted(true);
    setFormAlert([]);
    if (!check.fields) {
      if (!rule) form.setFieldError('ruleId', 'Choose the drug and concentration');
      setFormAlert(['Complete the regimen: every required amount, as a number.']);
      return;
    }
    if (blocking.length > 0) {
      setFormAlert([
        `Signing is blocked: correct ${blocking.length === 1 ? 'the value' : `the ${blocking.length} values`} marked as an error or outside a hard limit.`,
      ]);
      return;
    }
    const { signature: _unused, ...request } = orderRequest(check.fields, values, soft, '');
    const errors = unsignedOrderErrors(request, soft);
    if (Object.keys(errors).length > 0) {
      form.setErrors(errors);
      return;
    }
    setUnsigned(request);
  });

  const onRefusedFields = (error: unknown) => {
    setUnsigned(null);
    if (!isApiRequestError(error)) return;
    const overrideFields = unsigned?.overrides.map((override) => override.field) ?? [];
    const { fieldErrors, otherErrors } = placeOrderErrors(error.errors, overrideFields, soft);
    form.setErrors(fieldErrors);
    setFormAlert([error.message, ...otherErrors]);
  };

  const onSigned = (order: OrderDetail) => {
    idempotency.renew();
    setUnsigned(null);
    notifySuccess('Order signed', `PCA order ${order.id} is waiting for pharmacy verification.`);
    navigate(paths.order.getHref(order.id));
  };

  return (
    <Stack gap="md">
      <Title order={1}>{revising ? `Revise PCA order ${revising.id}` : 'New PCA order'}</Title>
      {patientBanner}
      {revising?.statusReason ? (
        <Alert color="grape" variant="light" icon={<IconArrowBackUp aria-hidden />} title="Pharmacist's query">
          <Text size="sm">{revising.statusReason}</Text>
        </Alert>
      ) : null}
      {check.openPca ? <OpenPcaAlert open={check.openPca} /> : null}
      {formAlert.length > 0 ? (
        <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="The order is not signed yet" role="alert">
          {formAlert.join(' ')}
        </Alert>
      ) : null}
      <form onSubmit={startSigning} noValidate aria-label={revising ? 'Revised PCA order' : 'New PCA order'}>
        <Grid gap="lg">
          <Grid.Col span={{ base: 12, lg: 8 }}>
            <Stack gap="md">
              <DrugSection
                rules={pickable}
                sets={sets}
                weightKg={patient.weightKg}
                ruleId={form.values.ruleId}
                ruleError={form.errors.ruleId}
                findings={check.findings.filter((finding) => RULE_FINDING_FIELDS.includes(finding.field))}
                onRuleChange={(ruleId) => form.setFieldValue('ruleId', ruleId)}
                onPickSet={pickSet}
              />
              <RegimenSection
                form={form}
                rule={check.checkedRule ?? (rule ? { ...rule, perKg: false, limits: {} } : null)}
                weightKg={patient.weightKg}
                findings={check.findings}
                softFields={regimenSoft}
                showFinding={showFinding}
                revising={revising}
              />
              <FindingReasons form={form} findings={otherSoftFindings} />
              <Paper withBorder radius="md" p="md">
                <Stack gap="md">
                  <Title order={2}>Indication and review</Title>
                  <TextInput
                    label="Indication"
                    description="Optional, e.g. pain after laparotomy"
                    size="md"
                    {...form.getInputProps('indication')}
                  />
                  <TextInput label="Review date" type="date" size="md" withAsterisk maw={260} {...form.getInputProps('reviewDate')} />
                </Stack>
              </Paper>
              <Group gap="md">
                <Button type="submit" size="md" leftSection={<IconSignature size={18} aria-hidden />}>
                  Sign order
                </Button>
                <Text size="sm" c={blocking.length > 0 ? 'red.8' : 'dimmed'}>
                  {blocking.length > 0
                    ? `Signing is blocked while ${blocking.length === 1 ? 'a value is' : 'values are'} marked as an error or outside a hard limit.`
                    : soft.length > 0
                      ? 'Each value outside a soft limit needs a reason to sign.'
                      : 'You will type your password again to sign.'}
                </Text>
              </Group>
            </Stack>
          </Grid.Col>
          <Grid.Col span={{ base: 12, lg: 4 }}>
            <div style={{ position: 'sticky', top: 72 }}>
              <OrderCheckPanel check={check} doseUnit={rule?.doseUnit ?? null} rule={check.checkedRule} weightKg={patient.weightKg} />
            </div>
          </Grid.Col>
        </Grid>
      </form>
      {unsigned && rule ? (
        <SignOrderModal
          unsigned={unsigned}
          drugName={rule.drugName}
          revisingId={revising?.id}
          idempotencyKey={idempotency.key}
          onSigned={onSigned}
          onRefusedFields={onRefusedFields}
          onClose={() => setUnsigned(null)}
        />
      ) : null}
    </Stack>
  );
}
