import { ConflictException, ForbiddenException, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, In } from 'typeorm';
import {
  canDoLibraryAction,
  LIBRARY_CONTRIBUTIONS,
  LIBRARY_STATUS_LABELS,
  LIBRARY_VERSION_ACTIONS,
  type LibraryVersionAction,
  type LibraryVersionDetail,
  type LimitRuleInput,
  populationKey,
  populationProblems,
  type RuleProblem,
  rulePopulationOf,
  validateLimitRules,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { Drug } from '../drugs/entities/drug.entity.js';
import { UsersService } from '../users/users.service.js';
import { Ward } from '../wards/entities/ward.entity.js';
import { toLibraryVersionDetail } from './dto/library-response.js';
import { LibraryVersionEvent, type LibraryVersionEventKind } from './entities/library-version-event.entity.js';
import { LibraryVersion } from './entities/library-version.entity.js';
import { LimitRule } from './entities/limit-rule.entity.js';
import { LibraryService } from './library.service.js';
import { fieldError, fieldErrors } from '../common/errors/field-error.js';
import { recordAudit } from '../audit/record-audit.js';

/**
 * The library's life: draft → pending_approval → active → retired. Every change is one
 * transaction; a second pharmacist approves, and the old active version retires in the same one.
 * Everyone who created, imported, edited or submitted a version is recorded with it
 * (LibraryVersionEvent), and none of them may approve it.
 */
@Injectable()
export class LibraryVersionsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly library: LibraryService,
    private readonly users: UsersService,
  ) {}

  /** A new draft for the ward, starting from a copy of its active rules (or given rules). */
  async createDraft(wardId: number, note: string | undefined, author: AuthUser, rules?: LimitRuleInput[]): Promise<LibraryVersionDetail> {
    return this.dataSource.transaction(async (manager) => {
      if (!(await manager.existsBy(Ward, { id: wardId }))) {
        throw fieldError('wardId', `No ward with id ${wardId}`);
      }
      const open = await manager.findOneBy(LibraryVersion, { wardId, status: In(['draft', 'pending_approval']) });
      if (open) {
        throw new ConflictException(
          `This ward already has version ${open.number} (${LIBRARY_STATUS_LABELS[open.status].toLowerCase()}); finish or discard it before starting another`,
        );
      }
      const active = await manager.findOne(LibraryVersion, { where: { wardId, status: 'active' }, relations: { rules: true } });
      const last = await manager.findOne(LibraryVersion, { where: { wardId }, order: { number: 'DESC' } });
      const draft = await manager.save(
        manager.create(LibraryVersion, {
          wardId,
          number: (last?.number ?? 0) + 1,
          status: 'draft',
          note: note?.trim() ?? '',
          authorId: author.id,
        }),
      );
      const startingRules =
        rules ??
        active?.rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits, ...rule }) => ({
          drugId,
          concentrationPerMl,
          doseUnit,
          perKg,
          ...rulePopulationOf(rule),
          limits,
        })) ??
        [];
      // A copy of the active rules is written as it is, so a rule saved before a check existed
      // (a per-kg rule without ceilings) can be corrected in the draft; submitting checks it all.
      await this.writeRules(manager, draft.id, startingRules, { check: rules !== undefined });
      await this.recordEvent(manager, draft.id, author, rules ? 'imported' : 'created');
      await recordAudit(manager, author, {
        action: rules ? 'library-version.import' : 'library-version.create',
        entityType: 'library-version',
        entityId: draft.id,
        summary: {
          wardId,
          number: draft.number,
          note: draft.note,
          rules: startingRules.length,
          ...(rules ? {} : { copiedFromVersion: active?.number ?? null }),
        },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, draft.id));
    });
  }

  async replaceRules(id: number, rules: LimitRuleInput[], author: AuthUser): Promise<LibraryVersionDetail> {
    return this.dataSource.transaction(async (manager) => {
      const version = await this.lockedVersion(manager, id, 'edit');
      await manager.delete(LimitRule, { versionId: version.id });
      await this.writeRules(manager, version.id, rules);
      await this.recordEvent(manager, version.id, author, 'edited');
      await recordAudit(manager, author, {
        action: 'library-version.rules-replace',
        entityType: 'library-version',
        entityId: id,
        summary: { rules: { from: version.rules.length, to: rules.length } },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, id));
    });
  }

  async submit(id: number, note: string | undefined, author: AuthUser): Promise<LibraryVersionDetail> {
    return this.dataSource.transaction(async (manager) => {
      const version = await this.lockedVersion(manager, id, 'submit');
      const rules = await manager.findBy(LimitRule, { versionId: id });
      if (rules.length === 0) {
        throw fieldError('rules', 'A library version needs at least one rule before it is submitted');
      }
      const problems = await this.ruleProblems(manager, version.wardId, rules);
      if (problems.length > 0) {
        throw fieldErrors(
          'Some limit rules need correcting before the version is submitted',
          problems.map((problem) => ({ field: problem.path, message: problem.message })),
        );
      }
      await manager.update(
        LibraryVersion,
        { id },
        { status: 'pending_approval', submittedAt: new Date(), ...(note?.trim() ? { note: note.trim() } : {}) },
      );
      await this.recordEvent(manager, id, author, 'submitted');
      await recordAudit(manager, author, {
        action: 'library-version.submit',
        entityType: 'library-version',
        entityId: id,
        summary: { status: { from: version.status, to: 'pending_approval' }, ...(note?.trim() ? { note: note.trim() } : {}) },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, id));
    });
  }

  /** Back to draft, for changes after a colleague's query. */
  async withdraw(id: number, user: AuthUser): Promise<LibraryVersionDetail> {
    return this.dataSource.transaction(async (manager) => {
      await this.lockedVersion(manager, id, 'withdraw');
      await manager.update(LibraryVersion, { id }, { status: 'draft', submittedAt: null });
      await recordAudit(manager, user, {
        action: 'library-version.withdraw',
        entityType: 'library-version',
        entityId: id,
        summary: { status: { from: 'pending_approval', to: 'draft' } },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, id));
    });
  }

  /** A draft that is not wanted is removed; versions that were ever active are kept for the record. */
  async discard(id: number, user: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const version = await this.lockedVersion(manager, id, 'discard');
      await manager.delete(LibraryVersion, { id });
      await recordAudit(manager, user, {
        action: 'library-version.delete',
        entityType: 'library-version',
        entityId: id,
        summary: { wardId: version.wardId, number: version.number, rules: version.rules.length },
      });
    });
  }

  /** `reviewedSubmission` is the version's `submittedAt` as the approver saw it. */
  async approve(id: number, approver: AuthUser, password: string, reviewedSubmission: string): Promise<LibraryVersionDetail> {
    await this.users.verifySignature(approver.id, password);
    return this.dataSource.transaction(async (manager) => {
      const version = await this.lockedVersion(manager, id, 'approve');
      const contributed = contributionsOf(version, approver.id);
      if (contributed) {
        throw new ForbiddenException(`A second pharmacist must approve: you ${contributed} this version`);
      }
      if (version.submittedAt?.getTime() !== Date.parse(reviewedSubmission)) {
        throw new ConflictException(
          `Version ${version.number} was withdrawn and submitted again after you opened it: review its changes again, then approve`,
        );
      }
      const now = new Date();
      await manager.update(LibraryVersion, { wardId: version.wardId, status: 'active' }, { status: 'retired', retiredAt: now });
      await manager.update(LibraryVersion, { id }, { status: 'active', approverId: approver.id, approvedAt: now });
      await recordAudit(manager, approver, {
        action: 'library-version.approve',
        entityType: 'library-version',
        entityId: id,
        summary: { wardId: version.wardId, number: version.number, status: { from: version.status, to: 'active' }, signed: true },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, id));
    });
  }

  /**
   * A reviewing pharmacist (not one who wrote it) sends a submitted version back to draft, signed,
   * with a comment saying what to change; its authors see the comment on the version.
   */
  async sendBack(id: number, reviewer: AuthUser, password: string, comment: string): Promise<LibraryVersionDetail> {
    await this.users.verifySignature(reviewer.id, password);
    return this.dataSource.transaction(async (manager) => {
      const version = await this.lockedVersion(manager, id, 'sendBack');
      const contributed = contributionsOf(version, reviewer.id);
      if (contributed) {
        throw new ForbiddenException(
          `You ${contributed} this version: withdraw it to draft instead; sending back is for a reviewing pharmacist`,
        );
      }
      const text = comment.trim();
      await manager.update(LibraryVersion, { id }, { status: 'draft', submittedAt: null });
      await this.recordEvent(manager, id, reviewer, 'sent-back', text);
      await recordAudit(manager, reviewer, {
        action: 'library-version.send-back',
        entityType: 'library-version',
        entityId: id,
        summary: { status: { from: version.status, to: 'draft' }, comment: text, signed: true },
      });
      return toLibraryVersionDetail(await this.library.loadVersion(manager, id));
    });
  }

  private async recordEvent(
    manager: EntityManager,
    versionId: number,
    user: AuthUser,
    kind: LibraryVersionEventKind,
    comment: string | null = null,
  ): Promise<void> {
    await manager.insert(LibraryVersionEvent, { versionId, userId: user.id, kind, comment });
  }

  /** The version, if the library lifecycle allows `action` in its status; 409 naming the status otherwise. */
  private async lockedVersion(manager: EntityManager, id: number, action: LibraryVersionAction): Promise<LibraryVersion> {
    const version = await this.library.loadVersion(manager, id);
    if (!canDoLibraryAction(action, version.status)) {
      throw new ConflictException(
        `Version ${version.number} is ${LIBRARY_STATUS_LABELS[version.status].toLowerCase()}, so you cannot ${LIBRARY_VERSION_ACTIONS[action].what}`,
      );
    }
    return version;
  }

  /**
   * validateLimitRules, and per-kg ceilings also against the adult rules of the other wards'
   * active libraries (a children's ward's library may hold no adult rule of its own).
   */
  private async ruleProblems(manager: EntityManager, wardId: number, rules: LimitRuleInput[]): Promise<RuleProblem[]> {
    const problems = validateLimitRules(rules);
    if (!rules.some((rule) => rule.perKg)) return problems;
    const adultsElsewhere = await manager
      .createQueryBuilder(LimitRule, 'rule')
      .innerJoinAndSelect('rule.version', 'version', 'version.status = :status AND version.wardId != :wardId', { status: 'active', wardId })
      .innerJoinAndSelect('version.ward', 'ward')
      .where('rule.population = :population AND rule.perKg = 0', { population: 'adult' })
      .getMany();
    const seen = new Set(problems.map((problem) => `${problem.path} ${problem.message}`));
    const elsewhere = adultsElsewhere.map((rule) => ({ ...rule, wardName: rule.version.ward.name }));
    for (const problem of populationProblems(rules, elsewhere)) {
      if (!seen.has(`${problem.path} ${problem.message}`)) problems.push(problem);
    }
    return problems;
  }

  private async writeRules(manager: EntityManager, versionId: number, rules: LimitRuleInput[], options = { check: true }): Promise<void> {
    const version = await manager.findOneByOrFail(LibraryVersion, { id: versionId });
    const problems = options.check ? await this.ruleProblems(manager, version.wardId, rules) : [];
    const drugs = await manager.findBy(Drug, { id: In([...new Set(rules.map((rule) => rule.drugId))]) });
    rules.forEach((rule, index) => {
      const drug = drugs.find((candidate) => candidate.id === rule.drugId);
      if (!drug) problems.push({ path: `rules.${index}.drugId`, message: `No drug with id ${rule.drugId}` });
      else if (drug.doseUnit !== rule.doseUnit) {
        problems.push({
          path: `rules.${index}.doseUnit`,
          message: `${drug.genericName} is dosed in ${drug.doseUnit}, not ${rule.doseUnit}`,
        });
      }
    });
    if (problems.length > 0) {
      throw fieldErrors(
        'Some limit rules need correcting',
        problems.map((problem) => ({ field: problem.path, message: problem.message })),
      );
    }
    if (rules.length > 0) {
      // Without updateEntity(false) TypeORM reads the inserted rows back with one `id = ? OR …`
      // term per row, and SQLite refuses an expression that deep (over 1000 terms): a 500.
      await manager
        .createQueryBuilder()
        .insert()
        .into(LimitRule)
        .values(
          rules.map(({ drugId, concentrationPerMl, doseUnit, perKg, limits, ...rule }) => ({
            versionId,
            drugId,
            concentrationPerMl,
            doseUnit,
            perKg,
            ...rulePopulationOf(rule),
            populationKey: populationKey(rule),
            limits,
          })),
        )
        .updateEntity(false)
        .execute();
    }
  }
}

/** What `userId` did to the version's content ("created, edited and submitted"); empty if nothing. */
function contributionsOf(version: LibraryVersion, userId: number): string {
  const kinds = new Set(version.events.filter((event) => event.userId === userId && event.kind !== 'sent-back').map((event) => event.kind));
  // Versions from before contributions were recorded still name their author.
  if (version.authorId === userId && !kinds.has('imported')) kinds.add('created');
  const done = LIBRARY_CONTRIBUTIONS.filter((kind) => kinds.has(kind));
  return done.length <= 1 ? (done[0] ?? '') : `${done.slice(0, -1).join(', ')} and ${done[done.length - 1]}`;
}
