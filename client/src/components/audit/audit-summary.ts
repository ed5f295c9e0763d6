import { ORDER_STATUS_LABELS, ROLE_LABELS } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';

/** One readable line of an event's summary: "Respiratory rate min" and "8 → 10". */
export interface SummaryFact {
  label: string;
  value: string;
}

const ACRONYMS: Record<string, string> = { id: 'ID', ids: 'IDs', mrn: 'MRN', pca: 'PCA', csv: 'CSV', spo2: 'SpO₂', ml: 'mL' };
const ISO_TIMESTAMP = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;
const SNAKE_WORDS = /^[a-z]+(_[a-z]+)+$/;
// Nested objects are flattened this deep ("Settings › Demand dose"); deeper ones are inlined.
const MAX_DEPTH = 2;

/** `respiratoryRateMin`, `ward_id` or `library-version` as "Respiratory rate min", "Ward ID", "Library version". */
export function humaniseKey(key: string): string {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/([A-Z]+)([A-Z][a-z])/g, '$1 $2')
    .split(/[\s_\-.]+/)
    .filter(Boolean)
    .map((word) => ACRONYMS[word.toLowerCase()] ?? word.toLowerCase());
  if (words.length === 0) return key;
  const [first, ...rest] = words;
  return [first.charAt(0).toUpperCase() + first.slice(1), ...rest].join(' ');
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** A change written as `{from, to}` and nothing else. */
export function isChange(value: unknown): value is { from: unknown; to: unknown } {
  if (!isPlainObject(value)) return false;
  const keys = Object.keys(value);
  return keys.length === 2 && 'from' in value && 'to' in value;
}

function formatText(text: string, key: string): string {
  if (/status$/i.test(key) && text in ORDER_STATUS_LABELS) return ORDER_STATUS_LABELS[text as keyof typeof ORDER_STATUS_LABELS];
  if (/role$/i.test(key) && text in ROLE_LABELS) return ROLE_LABELS[text as keyof typeof ROLE_LABELS];
  if (ISO_TIMESTAMP.test(text)) return formatDateTime(text);
  if (SNAKE_WORDS.test(text)) return text.replaceAll('_', ' ');
  return text;
}

/** Any summary value as text; `key` lets statuses and roles read as their labels. */
export function formatSummaryValue(value: unknown, key = ''): string {
  if (value === null || value === undefined) return 'none';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : 'none';
  if (typeof value === 'string') return value === '' ? 'none' : formatText(value, key);
  if (Array.isArray(value)) return value.length === 0 ? 'none' : value.map((item) => formatSummaryValue(item, key)).join(', ');
  if (isChange(value)) return `${formatSummaryValue(value.from, key)} → ${formatSummaryValue(value.to, key)}`;
  if (isPlainObject(value)) {
    const parts = Object.entries(value).map(([innerKey, inner]) => `${humaniseKey(innerKey)}: ${formatSummaryValue(inner, innerKey)}`);
    return parts.length === 0 ? 'none' : parts.join('; ');
  }
  return String(value);
}

function collect(summary: Record<string, unknown>, prefix: string, depth: number, out: SummaryFact[]): void {
  for (const [key, value] of Object.entries(summary)) {
    const label = prefix ? `${prefix} › ${humaniseKey(key)}` : humaniseKey(key);
    if (isPlainObject(value) && !isChange(value) && depth < MAX_DEPTH && Object.keys(value).length > 0) {
      collect(value, label, depth + 1, out);
    } else if (Array.isArray(value) && value.length > 0 && value.every(isPlainObject)) {
      // A list of records (e.g. the differences a bedside check found): one line each.
      value.forEach((item, index) => out.push({ label: `${label} (${index + 1})`, value: formatSummaryValue(item, key) }));
    } else {
      out.push({ label, value: formatSummaryValue(value, key) });
    }
  }
}

/** An event's summary as label–value lines, in the order the server wrote them. */
export function summaryFacts(summary: Record<string, unknown>): SummaryFact[] {
  const facts: SummaryFact[] = [];
  collect(summary, '', 1, facts);
  return facts;
}
