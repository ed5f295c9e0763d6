import { useMemo } from 'react';
import { useDebouncedValue } from '@mantine/hooks';
import {
  deriveOrderValues,
  type Finding,
  type LimitRuleResponse,
  type OrderDerivedValues,
  type OrderFields,
  type Patient,
  patientFactorsOf,
  duplicatePcaFinding,
  ONE_PCA_STATUSES,
  openPcaFor,
  type OtherPcaOrder,
  DEFAULT_WARD_POLICY,
} from '@lockstep/shared';
import { useOtherActiveLibraries } from '@/api/library/get-other-active-libraries';
import { useOrderPreview } from '@/api/orders/preview-order';
import { useOrders } from '@/api/orders/get-orders';
import { useWardPolicy } from '@/api/wards/get-ward-policy';
import { useWards } from '@/api/wards/get-wards';
import { sameFindings } from '../utils/findings';
import { readOrderForm, type OrderFormValues } from '../utils/order-form';
import { patientRuleFindings, ruleForPatient } from '../utils/rule-for-patient';

/** Where the server's confirmation of the local check stands. */
export type ServerCheck = 'waiting' | 'checking' | 'agrees' | 'differs' | 'failed';

export interface OrderCheck {
  /** What the API takes; null until a rule is chosen and every number reads. */
  fields: OrderFields | null;
  derived: OrderDerivedValues | null;
  /** The findings to act on: the local check, or the server's where it differs. */
  findings: Finding[];
  server: ServerCheck;
  /** The patient's open PCA that signing would duplicate (the API answers 409), or null. */
  openPca: OtherPcaOrder | null;
  /** The rule the order is checked against, chosen by the patient (shared chooseRule); null when none fits. */
  checkedRule: LimitRuleResponse | null;
}

// Long enough not to ask on every keystroke, short enough to answer before the hand leaves the keys.
const SERVER_CHECK_DELAY_MS = 400;

function sameFields(a: OrderFields | null, b: OrderFields | null): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * The live check beside the order form: `checkOrder` and `deriveOrderValues` from shared on every
 * keystroke, confirmed by the server's preview once typing pauses. The server runs the same
 * functions on the same library; if it ever disagrees, its answer is the one shown.
 */
export function useOrderCheck(
  values: OrderFormValues,
  rule: LimitRuleResponse | null,
  patient: Patient,
  wardRules: readonly LimitRuleResponse[],
  revisingId?: number,
): OrderCheck {
  const openOrders = useOrders({ patientId: patient.id, status: ONE_PCA_STATUSES });
  const openPca = openPcaFor(openOrders.data ?? [], revisingId);
  // Until the ward's own rule loads, the shipped default: never "no limit" on the weight's age.
  const weightMaxAgeDays = useWardPolicy(patient.wardId).data?.weightMaxAgeDays ?? DEFAULT_WARD_POLICY.weightMaxAgeDays;
  const read = useMemo(() => readOrderForm(values, rule, patient.id), [values, rule, patient.id]);
  const factors = useMemo(() => patientFactorsOf(patient, new Date()), [patient]);
  // The rule is chosen by the patient: the ward's library first, the other wards' only when it has none for them.
  const ownChoice = useMemo(() => (rule ? ruleForPatient(rule, factors, wardRules, null) : null), [rule, factors, wardRules]);
  const wards = useWards();
  const otherWards = ownChoice?.needsOtherLibraries ? (wards.data ?? []).filter((ward) => ward.id !== patient.wardId) : [];
  const { libraries } = useOtherActiveLibraries(otherWards);
  const chosen = useMemo(
    () => (rule && ownChoice?.needsOtherLibraries ? ruleForPatient(rule, factors, wardRules, libraries) : ownChoice),
    [rule, ownChoice, factors, wardRules, libraries],
  );
  const local = useMemo(() => {
    if (!rule || !chosen) return null;
    const today = new Date().toISOString().slice(0, 10);
    const context = { drug: { id: rule.drugId, genericName: rule.drugName }, today, weightMaxAgeDays };
    const findings = patientRuleFindings(read, rule, chosen, factors, context);
    // The preview puts the same refusal first, so the two lists stay comparable.
    return { derived: deriveOrderValues(read.regimen), findings: openPca ? [duplicatePcaFinding(openPca), ...findings] : findings };
  }, [read, rule, chosen, factors, weightMaxAgeDays, openPca]);
  const checkedRule = chosen?.rule ?? null;

  const [settledFields] = useDebouncedValue(read.fields, SERVER_CHECK_DELAY_MS);
  const preview = useOrderPreview(settledFields);

  if (!local)
    return {
      fields: null,
      derived: null,
      findings: openPca ? [duplicatePcaFinding(openPca)] : [],
      server: 'waiting',
      openPca,
      checkedRule,
    };

  const current = read.fields !== null && sameFields(settledFields, read.fields) && !preview.isPlaceholderData;
  let server: ServerCheck = 'waiting';
  let findings = local.findings;
  if (read.fields === null) server = 'waiting';
  else if (!current || preview.isFetching) server = 'checking';
  else if (preview.isError) server = 'failed';
  else if (preview.data) {
    if (sameFindings(local.findings, preview.data.findings)) server = 'agrees';
    else {
      server = 'differs';
      findings = preview.data.findings;
    }
  }
  return { fields: read.fields, derived: local.derived, findings, server, openPca, checkedRule };
}
