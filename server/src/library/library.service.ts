import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager, In } from 'typeorm';
import {
  chooseRule,
  diffLibrary,
  type LibraryDiff,
  type LibraryVersion as LibraryVersionResponse,
  type LibraryVersionDetail,
  type PatientForRule,
  type RuleChoice,
} from '@lockstep/shared';
import { Ward } from '../wards/entities/ward.entity.js';
import { toLibraryVersionDetail, toLibraryVersionResponse } from './dto/library-response.js';
import { LibraryVersion } from './entities/library-version.entity.js';
import { LimitRule } from './entities/limit-rule.entity.js';
import { toNamedRule } from './named-rule.js';

const VERSION_RELATIONS = { ward: true, author: true, approver: true, rules: { drug: true }, events: { user: true } } as const;

/** Reading the dose-limit library: active versions, version lists, single versions, diffs. */
@Injectable()
export class LibraryService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async getActive(wardId: number): Promise<LibraryVersionDetail> {
    const version = await this.dataSource.manager.findOne(LibraryVersion, {
      where: { wardId, status: 'active' },
      relations: VERSION_RELATIONS,
    });
    if (!version) {
      if (!(await this.dataSource.manager.existsBy(Ward, { id: wardId }))) throw new NotFoundException(`No ward with id ${wardId}`);
      throw new NotFoundException('This ward has no active dose-limit library yet');
    }
    return toLibraryVersionDetail(version);
  }

  async getVersion(id: number): Promise<LibraryVersionDetail> {
    return toLibraryVersionDetail(await this.loadVersion(this.dataSource.manager, id));
  }

  /** Newest first. Two queries whatever the number of versions. */
  async list(wardId?: number): Promise<LibraryVersionResponse[]> {
    const versions = await this.dataSource.manager.find(LibraryVersion, {
      where: wardId === undefined ? {} : { wardId },
      relations: { ward: true, author: true, approver: true },
      order: { wardId: 'ASC', number: 'DESC' },
    });
    const counts = await this.ruleCounts(versions.map((version) => version.id));
    return versions.map((version) => toLibraryVersionResponse(version, counts.get(version.id) ?? 0));
  }

  /** The version's changes against the ward's active version (all added when none is active). */
  async diff(id: number): Promise<LibraryDiff & { againstVersionId: number | null }> {
    const version = await this.loadVersion(this.dataSource.manager, id);
    const active = await this.dataSource.manager.findOne(LibraryVersion, {
      where: { wardId: version.wardId, status: 'active' },
      relations: VERSION_RELATIONS,
    });
    const base = active && active.id !== version.id ? active.rules.map(toNamedRule) : [];
    return { ...diffLibrary(base, version.rules.map(toNamedRule)), againstVersionId: active?.id ?? null };
  }

  /**
   * The active rule for a patient on their ward, for one drug at one concentration, chosen by the
   * patient (shared chooseRule): the ward's library first, then the other wards' active libraries
   * (by ward name), so a child on an adult ward gets a paediatric rule or none, never adult limits.
   * Two queries: the ward's candidates, and only when they hold no rule for the patient, the others'.
   */
  async findActiveRule(
    wardId: number,
    order: { drugId: number; concentrationPerMl: number },
    patient: PatientForRule,
  ): Promise<RuleChoice<LimitRule>> {
    const candidates = (elsewhere: boolean) =>
      this.dataSource.manager
        .createQueryBuilder(LimitRule, 'rule')
        .innerJoinAndSelect('rule.version', 'version', `version.wardId ${elsewhere ? '!=' : '='} :wardId AND version.status = :status`, {
          wardId,
          status: 'active',
        })
        .innerJoinAndSelect('version.ward', 'ward')
        .innerJoinAndSelect('rule.drug', 'drug')
        .where('rule.drugId = :drugId', { drugId: order.drugId })
        // Concentrations are decimals typed by people; compare with a tolerance, not bit for bit.
        .andWhere('abs(rule.concentrationPerMl - :concentration) < 1e-9', { concentration: order.concentrationPerMl })
        .orderBy('ward.name', 'ASC')
        .addOrderBy('rule.id', 'ASC')
        .getMany();
    const own = await candidates(false);
    const choice = chooseRule(order, patient, own);
    if (choice.kind === 'ward') return choice;
    const others = await candidates(true);
    const libraries = new Map<string, LimitRule[]>();
    for (const rule of others) libraries.set(rule.version.ward.name, [...(libraries.get(rule.version.ward.name) ?? []), rule]);
    return chooseRule(
      order,
      patient,
      own,
      [...libraries].map(([wardName, rules]) => ({ wardName, rules })),
    );
  }

  async loadVersion(manager: EntityManager, id: number): Promise<LibraryVersion> {
    const version = await manager.findOne(LibraryVersion, { where: { id }, relations: VERSION_RELATIONS });
    if (!version) throw new NotFoundException(`No library version with id ${id}`);
    return version;
  }

  private async ruleCounts(versionIds: number[]): Promise<Map<number, number>> {
    if (versionIds.length === 0) return new Map();
    const rows: { versionId: number; count: number }[] = await this.dataSource.manager
      .createQueryBuilder(LimitRule, 'rule')
      .select('rule.versionId', 'versionId')
      .addSelect('count(*)', 'count')
      .where({ versionId: In(versionIds) })
      .groupBy('rule.versionId')
      .getRawMany();
    return new Map(rows.map((row) => [Number(row.versionId), Number(row.count)]));
  }
}
