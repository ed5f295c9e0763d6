import type {
  LibraryContributor,
  LibrarySendBack,
  LibraryVersion as LibraryVersionResponse,
  LibraryVersionDetail,
  LimitRuleResponse,
} from '@lockstep/shared';
import type { LibraryVersion } from '../entities/library-version.entity.js';
import type { LimitRule } from '../entities/limit-rule.entity.js';

/** Expects `drug` to be loaded. */
export function toLimitRuleResponse(rule: LimitRule): LimitRuleResponse {
  return {
    id: rule.id,
    drugId: rule.drugId,
    drugName: rule.drug.genericName,
    concentrationPerMl: rule.concentrationPerMl,
    doseUnit: rule.doseUnit,
    perKg: rule.perKg,
    population: rule.population,
    minAgeYears: rule.minAgeYears,
    maxAgeYears: rule.maxAgeYears,
    minWeightKg: rule.minWeightKg,
    maxWeightKg: rule.maxWeightKg,
    limits: rule.limits,
  };
}

/** Expects `ward`, `author` and `approver` to be loaded; `ruleCount` from the caller. */
export function toLibraryVersionResponse(version: LibraryVersion, ruleCount: number): LibraryVersionResponse {
  return {
    id: version.id,
    wardId: version.wardId,
    wardName: version.ward.name,
    number: version.number,
    status: version.status,
    note: version.note,
    authorId: version.authorId,
    authorName: version.author.displayName,
    approverId: version.approverId,
    approverName: version.approver?.displayName ?? null,
    createdAt: version.createdAt.toISOString(),
    submittedAt: version.submittedAt?.toISOString() ?? null,
    approvedAt: version.approvedAt?.toISOString() ?? null,
    retiredAt: version.retiredAt?.toISOString() ?? null,
    ruleCount,
  };
}

/** Expects `rules.drug` and `events.user` loaded as well. Rules sorted by drug name, then concentration. */
export function toLibraryVersionDetail(version: LibraryVersion): LibraryVersionDetail {
  const rules = [...version.rules]
    .sort((a, b) => a.drug.genericName.localeCompare(b.drug.genericName) || a.concentrationPerMl - b.concentrationPerMl)
    .map(toLimitRuleResponse);
  const events = [...version.events].sort((a, b) => a.at.getTime() - b.at.getTime() || a.id - b.id);
  const contributors: LibraryContributor[] = [];
  let sentBack: LibrarySendBack | null = null;
  for (const event of events) {
    if (event.kind === 'sent-back') {
      sentBack = { byId: event.userId, byName: event.user.displayName, at: event.at.toISOString(), comment: event.comment ?? '' };
    } else {
      contributors.push({ userId: event.userId, userName: event.user.displayName, action: event.kind, at: event.at.toISOString() });
    }
  }
  return { ...toLibraryVersionResponse(version, rules.length), rules, contributors, sentBack };
}
