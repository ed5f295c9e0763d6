import { DEFAULT_EQUIANALGESIC_FACTORS } from '@lockstep/shared';
import type { EntityManager } from 'typeorm';
import { EquianalgesicFactor } from './entities/equianalgesic-factor.entity.js';

/**
 * The shipped equianalgesic table (NCI PDQ, see shared drugs/equianalgesic.ts) for a formulary just
 * written (the demo seed): each default's drug is found here by generic name, once; a drug not in
 * the formulary gets no row.
 */
export async function writeDefaultEquianalgesicFactors(
  manager: EntityManager,
  drugs: readonly { id: number; genericName: string }[],
  at: Date,
): Promise<void> {
  const rows = DEFAULT_EQUIANALGESIC_FACTORS.flatMap(({ genericName, ...factor }) => {
    const drug = drugs.find((candidate) => candidate.genericName === genericName);
    return drug ? [{ ...factor, drugId: drug.id, changedById: null, changedAt: at }] : [];
  });
  if (rows.length > 0) await manager.insert(EquianalgesicFactor, rows);
}
