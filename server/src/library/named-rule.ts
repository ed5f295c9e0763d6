import type { NamedRule } from '@lockstep/shared';
import { toLimitRuleResponse } from './dto/library-response.js';
import type { LimitRule } from './entities/limit-rule.entity.js';

/** A rule as the library diff and the CSV import compare it: by drug and concentration, no id. */
export function toNamedRule(rule: LimitRule): NamedRule {
  const { id: _id, ...named } = toLimitRuleResponse(rule);
  return named;
}
