import type { Population } from '@lockstep/shared';
import { DEMO_WARDS } from '../seed/demo-data.js';
import type { ScaleOptions } from './scale-options.js';

export type PlannedWard = {
  code: string;
  name: string;
  specialty: string;
  weightBasedDosing: boolean;
  /** A paediatric ward's observations use the children's bands. */
  population: Population;
  beds: number;
  /** Beds with a running PCA now. */
  active: number;
};

// Invented ward names after the demo's four; numbered once they run out.
const MORE_NAMES = [
  'Alder',
  'Birch',
  'Cove',
  'Dune',
  'Ember',
  'Fern',
  'Grove',
  'Heath',
  'Inlet',
  'Juniper',
  'Kelp',
  'Lark',
  'Moss',
  'Nook',
  'Orchard',
  'Pine',
  'Quay',
  'Reed',
  'Shore',
  'Tide',
  'Umber',
  'Vale',
  'Willow',
  'Yarrow',
  'Zephyr',
  'Aster',
];
const SPECIALTIES = [
  'General surgery',
  'Orthopaedics',
  'Urology',
  'Gynaecology',
  'Vascular surgery',
  'Colorectal surgery',
  'Trauma',
  'Thoracic surgery',
  'Plastic surgery',
  'High dependency',
];

/**
 * Splits the beds and active PCAs over the wards. The first ward is the busy one (half as many
 * beds again as the average and two and a half times the average number of PCAs), so its board
 * is the same size whether the hospital has 3 wards or 30: only the rest of the hospital grows.
 */
export function planWards(options: Pick<ScaleOptions, 'wards' | 'beds' | 'active'>): PlannedWard[] {
  const { wards, beds, active } = options;
  const busyBeds = wards === 1 ? beds : Math.min(beds - (wards - 1), Math.max(1, Math.round((1.5 * beds) / wards)));
  const busyActive = wards === 1 ? active : Math.min(active, Math.floor(busyBeds * 0.8), Math.ceil((2.5 * active) / wards));
  const restBeds = spread(beds - busyBeds, wards - 1);
  const restActive = spread(active - busyActive, wards - 1);
  return Array.from({ length: wards }, (_, index) => {
    const counts = index === 0 ? { beds: busyBeds, active: busyActive } : { beds: restBeds[index - 1], active: restActive[index - 1] };
    if (counts.active > counts.beds)
      throw new Error(
        `Ward ${index + 1} would have more PCAs (${counts.active}) than beds (${counts.beds}): lower --active or raise --beds`,
      );
    return { ...identity(index), ...counts };
  });
}

function identity(index: number): Omit<PlannedWard, 'beds' | 'active'> {
  const demo = DEMO_WARDS[index];
  if (demo)
    return {
      code: demo.code,
      name: demo.name,
      specialty: demo.specialty,
      weightBasedDosing: demo.weightBasedDosing,
      population: demo.population,
    };
  const n = index - DEMO_WARDS.length;
  const base = MORE_NAMES[n % MORE_NAMES.length];
  const round = Math.floor(n / MORE_NAMES.length);
  const name = round === 0 ? base : `${base} ${round + 1}`;
  return {
    code: `${base.slice(0, 3).toUpperCase()}${round === 0 ? '' : round + 1}`,
    name,
    specialty: SPECIALTIES[n % SPECIALTIES.length],
    weightBasedDosing: false,
    population: 'adult',
  };
}

function spread(total: number, parts: number): number[] {
  if (parts <= 0) return [];
  return Array.from({ length: parts }, (_, i) => Math.floor(total / parts) + (i < total % parts ? 1 : 0));
}
