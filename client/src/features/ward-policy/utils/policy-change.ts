import {
  DEFAULT_WARD_POLICY,
  formatDose,
  wardPolicyApprovalRefusal,
  type FieldError,
  type Role,
  type UpdateWardPolicyRequest,
  type WardPolicy,
  type WardPolicyChange,
  type WardPolicySettingChanges,
  type WardPolicySettings,
} from '@lockstep/shared';
import { formatPolicyValue, POLICY_NUMBER_FIELDS, type PolicyEmailKey } from './policy-form';

/** One setting of a proposed change, as shown: its label, from → to with units, and the shipped default. */
export interface SettingChangeRow {
  field: string;
  label: string;
  from: string;
  to: string;
  /** Lockstep's shipped default for the setting, or null for one this client does not know. */
  shippedDefault: string | null;
}

const EMAIL_KEYS: readonly PolicyEmailKey[] = ['pharmacyEmail', 'nurseInChargeEmail'];

/** A setting's value with its unit ("93 %", "9/min", "60 min"); one this client does not know, as a plain number. */
export function formatSettingValue(field: string, value: number): string {
  const known = POLICY_NUMBER_FIELDS.find((candidate) => candidate.key === field);
  return known ? formatPolicyValue(known, value) : formatDose(value, '');
}

function settingLabel(field: string): string {
  const known = POLICY_NUMBER_FIELDS.find((candidate) => candidate.key === field);
  return known ? known.label : field;
}

function shippedDefaultOf(field: string): string | null {
  if (!(field in DEFAULT_WARD_POLICY)) return null;
  return formatSettingValue(field, DEFAULT_WARD_POLICY[field as keyof WardPolicy]);
}

/** The rows of a change as the server holds it (each setting from its value when proposed). */
export function changeRows(settings: WardPolicyChange['settings']): SettingChangeRow[] {
  return settings.map(({ field, from, to }) => ({
    field,
    label: settingLabel(field),
    from: formatSettingValue(field, from),
    to: formatSettingValue(field, to),
    shippedDefault: shippedDefaultOf(field),
  }));
}

export interface SplitPolicyChanges {
  /** The clinical settings: proposed, signed, and applied only after a second sign-off. */
  settings: WardPolicySettingChanges;
  /** The e-mail addresses: not clinical, saved by the admin alone. */
  emails: Pick<UpdateWardPolicyRequest, PolicyEmailKey>;
}

/** The form's changes, split into what needs a sign-off and what the admin saves directly. */
export function splitPolicyChanges(changes: UpdateWardPolicyRequest): SplitPolicyChanges {
  const settings: Record<string, number> = {};
  const emails: Pick<UpdateWardPolicyRequest, PolicyEmailKey> = {};
  for (const [key, value] of Object.entries(changes)) {
    if (value === undefined) continue;
    if ((EMAIL_KEYS as readonly string[]).includes(key)) emails[key as PolicyEmailKey] = value as string;
    else settings[key] = value as number;
  }
  return { settings: settings as WardPolicySettingChanges, emails };
}

/** The rows the admin reviews before signing a proposal: each changed setting from its saved value. */
export function proposalRows(settings: WardPolicySettingChanges, saved: WardPolicySettings): SettingChangeRow[] {
  const rows: WardPolicyChange['settings'] = [];
  for (const [field, to] of Object.entries(settings)) {
    if (typeof to !== 'number') continue;
    rows.push({ field, from: saved[field as keyof WardPolicy], to });
  }
  return changeRows(rows);
}

export interface ProposalErrors {
  /** By setting (`changes.spo2Threshold` → `spo2Threshold`): shown beside the setting on the form. */
  settings: Record<string, string>;
  reason: string | null;
  password: string | null;
  /** Anything else, shown above the fields. */
  other: string[];
}

/** A proposal's 400 sorted onto where each message goes: the form's settings, the reason, the password. */
export function proposalErrors(errors: readonly FieldError[]): ProposalErrors {
  const sorted: ProposalErrors = { settings: {}, reason: null, password: null, other: [] };
  for (const { field, message } of errors) {
    if (field.startsWith('changes.')) sorted.settings[field.slice('changes.'.length)] ??= message;
    else if (field === 'reason') sorted.reason ??= message;
    else if (field.startsWith('signature')) sorted.password ??= message;
    else sorted.other.push(message);
  }
  return sorted;
}

/** Why the admin cannot propose now (a change is already waiting on this ward), or null. */
export function proposeBlock(pending: Pick<WardPolicyChange, 'proposedBy'> | null | undefined): string | null {
  if (!pending) return null;
  return `A change proposed by ${pending.proposedBy.name} is awaiting sign-off: a charge nurse or pharmacist signs it off or declines it before another can be proposed.`;
}

/** Why this person cannot sign off or decline the change (the server refuses too), or null when they can. */
export function signOffBlock(change: Pick<WardPolicyChange, 'proposedBy'>, user: { id: number; role: Role }): string | null {
  return wardPolicyApprovalRefusal(change.proposedBy.id, user);
}
