import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type DataSource, type EntityManager } from 'typeorm';
import {
  conversionFor,
  EQUIANALGESIC_ROUTES,
  equianalgesicAmountProblem,
  referenceDrugId,
  tallMan,
  type EquianalgesicFactor as EquianalgesicFactorResponse,
  type EquianalgesicRoute,
  type OralMorphineConversion,
} from '@lockstep/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { changedFields, recordAudit } from '../audit/record-audit.js';
import { fieldError } from '../common/errors/field-error.js';
import { Drug } from '../drugs/entities/drug.entity.js';
import { UsersService } from '../users/users.service.js';
import type { UpdateEquianalgesicFactorDto } from './dto/update-equianalgesic-factor.dto.js';
import { EquianalgesicFactor } from './entities/equianalgesic-factor.entity.js';

/** The factors one oral-morphine figure used, each with its source. */
type UsedFactors = {
  conversion: OralMorphineConversion;
  parenteralSource: string;
  oralSource: string;
};

function toResponse(factor: EquianalgesicFactor): EquianalgesicFactorResponse {
  return {
    drugId: factor.drugId,
    genericName: factor.drug.genericName,
    route: factor.route,
    amount: factor.amount,
    unit: factor.unit,
    source: factor.source,
    changedByName: factor.changedBy?.displayName ?? null,
    changedAt: factor.changedAt.toISOString(),
  };
}

const byDrugThenRoute = (a: EquianalgesicFactor, b: EquianalgesicFactor) =>
  a.drug.genericName.localeCompare(b.drug.genericName) || EQUIANALGESIC_ROUTES.indexOf(a.route) - EQUIANALGESIC_ROUTES.indexOf(b.route);

/**
 * Pharmacy's equianalgesic table (shared drugs/equianalgesic.ts): read by everyone who sees an
 * oral-morphine figure, changed by a pharmacist's signature, every change audited with before and after.
 */
@Injectable()
export class EquianalgesicService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly users: UsersService,
  ) {}

  async list(manager: EntityManager = this.dataSource.manager): Promise<EquianalgesicFactorResponse[]> {
    const factors = await manager.find(EquianalgesicFactor, { relations: { drug: true, changedBy: true } });
    return factors.sort(byDrugThenRoute).map(toResponse);
  }

  /**
   * Sets the row for `drugId` by `route` (creating it when the drug has none), signed with the
   * pharmacist's password. Sending what the row already holds changes nothing and records nothing,
   * so a repeated request (the same Idempotency-Key sent again) is harmless.
   */
  async update(
    drugId: number,
    route: EquianalgesicRoute,
    body: UpdateEquianalgesicFactorDto,
    pharmacist: AuthUser,
  ): Promise<EquianalgesicFactorResponse> {
    await this.users.verifySignature(pharmacist.id, body.signature.password);
    return this.dataSource.transaction(async (manager) => {
      const drug = await manager.findOneBy(Drug, { id: drugId });
      if (!drug) throw new NotFoundException(`No drug with id ${drugId}`);
      const rows = await manager.find(EquianalgesicFactor, { select: { id: true, drugId: true, route: true } });
      const reference = referenceDrugId(rows);
      if (route === 'oral' && reference !== null && reference !== drugId) {
        throw new ConflictException(
          'The table holds one oral factor, oral morphine against 10 mg parenteral morphine: change it on its own row',
        );
      }
      const problem = equianalgesicAmountProblem(body.amount, body.unit, route === 'parenteral' && reference === drugId);
      if (problem) throw fieldError('amount', problem);

      const existing = await manager.findOneBy(EquianalgesicFactor, { drugId, route });
      const after = { amount: body.amount, unit: body.unit, source: body.source };
      const changed = existing
        ? changedFields(existing, after)
        : Object.fromEntries(Object.entries(after).map(([field, to]) => [field, { from: null, to }]));
      if (Object.keys(changed).length > 0) {
        const saved = await manager.save(EquianalgesicFactor, {
          ...(existing ?? { drugId, route }),
          ...after,
          changedById: pharmacist.id,
          changedAt: new Date(),
        });
        await recordAudit(manager, pharmacist, {
          action: 'equianalgesic-factor.update',
          entityType: 'equianalgesic-factor',
          entityId: saved.id,
          summary: { drug: tallMan(drug.genericName), drugId, route, ...changed, signed: true },
        });
      }
      const row = await manager.findOneOrFail(EquianalgesicFactor, {
        where: { drugId, route },
        relations: { drug: true, changedBy: true },
      });
      return toResponse(row);
    });
  }

  /** The factors for an order's drug, read by its formulary id; null when pharmacy has set none. */
  async factorsFor(manager: EntityManager, drugId: number): Promise<UsedFactors | null> {
    const rows = await manager.find(EquianalgesicFactor, { where: [{ drugId, route: 'parenteral' }, { route: 'oral' }] });
    const found = conversionFor(drugId, rows);
    return found && { conversion: found.conversion, parenteralSource: found.parenteral.source, oralSource: found.oral.source };
  }
}
