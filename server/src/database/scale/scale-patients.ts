import type { AllergySeverity } from '@lockstep/shared';
import type { Random } from './random.js';
import type { ScalePatient } from './scale-orders.js';
import { type ScaleWriter, sqlTime } from './scale-writer.js';

// Invented names: common given names, family names built from syllables.
const GIVEN = [
  'Ari',
  'Bea',
  'Cal',
  'Dana',
  'Eli',
  'Fen',
  'Gia',
  'Hugo',
  'Ila',
  'Jonah',
  'Kit',
  'Lena',
  'Milo',
  'Nia',
  'Otto',
  'Pia',
  'Quinn',
  'Remy',
  'Sol',
  'Tess',
  'Uma',
  'Vik',
  'Wynn',
  'Yara',
  'Zev',
  'Anouk',
  'Bram',
  'Cleo',
  'Dov',
  'Esme',
];
const FAMILY_START = [
  'Ash',
  'Brook',
  'Cald',
  'Dun',
  'Elm',
  'Fair',
  'Gar',
  'Hal',
  'Ing',
  'Kel',
  'Lang',
  'Mor',
  'Nor',
  'Ost',
  'Pen',
  'Rad',
  'Sel',
  'Tor',
  'Und',
  'Wex',
];
const FAMILY_END = ['by', 'croft', 'dale', 'er', 'field', 'gate', 'holm', 'ley', 'mere', 'ow', 'ridge', 'stead', 'ton', 'well', 'wick'];
/** Allergy records: null for "no known allergies"; free text only, none to a formulary opioid. */
const ALLERGIES: (readonly { substance: string; reaction: string; severity: AllergySeverity }[] | null)[] = [
  null,
  null,
  null,
  [{ substance: 'Penicillin', reaction: 'rash', severity: 'allergy' }],
  [{ substance: 'Codeine', reaction: 'vomiting', severity: 'intolerance' }],
  [{ substance: 'Latex', reaction: 'hives', severity: 'allergy' }],
  [{ substance: 'Ibuprofen', reaction: 'wheeze', severity: 'allergy' }],
];

/** Writes invented patients with hospital numbers KB3000001, KB3000002, ... */
export class PatientFactory {
  private next = 3_000_001;

  constructor(
    private readonly writer: ScaleWriter,
    private readonly random: Random,
    private readonly now: number,
  ) {}

  /** A patient in `bed` of the ward; a child (4 to 16 years) on a paediatric ward. */
  create(wardId: number, bed: string, child: boolean): ScalePatient {
    const r = this.random;
    const age = child ? r.int(4, 16) : r.int(18, 92);
    const born = new Date(this.now - (age * 365.25 + r.int(0, 364)) * 86_400_000).toISOString().slice(0, 10);
    const weightKg = child ? Math.round((age * 3 + 8 + r.int(-3, 6)) * 10) / 10 : r.int(48, 125);
    const allergies = r.pick(ALLERGIES);
    const factors = { opioidTolerant: r.chance(0.12), sleepApnoea: !child && r.chance(0.1), otherSedatives: r.chance(0.15) };
    const id = this.writer.insert('patients', {
      mrn: `KB${this.next++}`,
      givenName: r.pick(GIVEN),
      familyName: r.pick(FAMILY_START) + r.pick(FAMILY_END),
      dateOfBirth: born,
      sex: r.pick(['female', 'male']),
      weightKg,
      weightMeasuredOn: new Date(this.now - r.int(0, 3) * 86_400_000).toISOString().slice(0, 10),
      noKnownAllergies: allergies === null ? 1 : 0,
      opioidTolerant: factors.opioidTolerant ? 1 : 0,
      // A tolerant patient's basis meets the FDA definition: at least 60 mg oral morphine a day for a week or longer.
      toleranceOralMorphineMgPerDay: factors.opioidTolerant ? r.pick([60, 90, 120, 200]) : null,
      toleranceDays: factors.opioidTolerant ? r.int(7, 365) : null,
      sleepApnoea: factors.sleepApnoea ? 1 : 0,
      otherSedatives: factors.otherSedatives ? 1 : 0,
      wardId,
      bed,
    });
    for (const allergy of allergies ?? [])
      this.writer.insert('patient_allergies', {
        patientId: id,
        drugId: null,
        ...allergy,
        recordedById: null,
        recordedAt: sqlTime(this.now - r.int(1, 72) * 3_600_000),
      });
    return { id, weightKg, dateOfBirth: born, ageYears: age, ...factors };
  }
}
