import type { Database, Statement } from 'better-sqlite3';

/** How TypeORM stores a `datetime` column on SQLite; the queries compare these strings. */
export function sqlTime(at: Date | number): string {
  return new Date(at).toISOString().replace('T', ' ').slice(0, 23);
}

type Row = Record<string, string | number | null>;

const TABLES = {
  drugs: ['genericName', 'doseUnit'],
  equianalgesic_factors: ['drugId', 'route', 'amount', 'unit', 'source', 'changedById', 'changedAt'],
  wards: ['code', 'name', 'specialty', 'weightBasedDosing', 'population', 'pharmacyEmail', 'nurseInChargeEmail'],
  users: ['username', 'displayName', 'role', 'passwordHash', 'email'],
  user_wards: ['userId', 'wardId'],
  library_versions: ['wardId', 'number', 'status', 'note', 'authorId', 'approverId', 'createdAt', 'submittedAt', 'approvedAt'],
  limit_rules: [
    'versionId',
    'drugId',
    'concentrationPerMl',
    'doseUnit',
    'perKg',
    'population',
    'minAgeYears',
    'maxAgeYears',
    'minWeightKg',
    'maxWeightKg',
    'populationKey',
    'limits',
  ],
  patients: [
    'mrn',
    'givenName',
    'familyName',
    'dateOfBirth',
    'sex',
    'weightKg',
    'weightMeasuredOn',
    'noKnownAllergies',
    'opioidTolerant',
    'toleranceOralMorphineMgPerDay',
    'toleranceDays',
    'sleepApnoea',
    'otherSedatives',
    'wardId',
    'bed',
  ],
  patient_allergies: ['patientId', 'drugId', 'substance', 'reaction', 'severity', 'recordedById', 'recordedAt'],
  pca_orders: [
    'patientId',
    'prescriberId',
    'drugId',
    'status',
    'regimenType',
    'version',
    'concentrationPerMl',
    'doseUnit',
    'loadingDose',
    'demandDose',
    'lockoutMinutes',
    'basalRatePerHour',
    'oneHourLimit',
    'fourHourLimit',
    'clinicianBolusDose',
    'indication',
    'reviewDate',
    'ruleSnapshot',
    'findingsSnapshot',
    'overrides',
    'signedAt',
    'verifiedById',
    'verifiedAt',
    'statusChangedAt',
    'statusReason',
    'startedAt',
    'rowVersion',
  ],
  order_events: ['orderId', 'fromStatus', 'toStatus', 'userId', 'at', 'reason'],
  syringe_releases: [
    'orderId',
    'releaseCode',
    'status',
    'concentrationPerMl',
    'volumeMl',
    'batch',
    'expiresAt',
    'preparedBy',
    'checkedBy',
    'releasedById',
    'releasedAt',
    'rowVersion',
  ],
  bedside_checks: [
    'orderId',
    'releaseId',
    'status',
    'firstNurseId',
    'firstSettings',
    'firstAt',
    'secondNurseId',
    'secondSettings',
    'secondAt',
    'differences',
    'rowVersion',
  ],
  release_reconciliations: [
    'releaseId',
    'dispensedMl',
    'infusedMl',
    'wastedMl',
    'discrepancyMl',
    'mustReport',
    'toleranceMl',
    'recordedById',
    'witnessId',
    'at',
  ],
  clinician_boluses: ['orderId', 'amount', 'reason', 'givenById', 'witnessId', 'at'],
  observations: [
    'orderId',
    'releaseId',
    'at',
    'painScore',
    'sedationLevel',
    'respiratoryRate',
    'spo2',
    'oxygenLitresPerMinute',
    'attempts',
    'delivered',
    'volumeInfusedMl',
    'syringeRemainingMl',
    'recordedById',
    'createdAt',
  ],
  flags: [
    'orderId',
    'releaseId',
    'severity',
    'code',
    'message',
    'action',
    'raisedAt',
    'acknowledgedAt',
    'acknowledgedById',
    'acknowledgeNote',
  ],
  handover_signoffs: ['wardId', 'orderId', 'shiftDate', 'shift', 'role', 'nurseId', 'pumpSettingsMatch', 'at'],
} as const;

export type Table = keyof typeof TABLES;

/**
 * One prepared INSERT per table, with named parameters; `insert` answers the new row's id and
 * counts rows per table for the report.
 */
export class ScaleWriter {
  readonly counts = new Map<Table, number>();
  private readonly statements = new Map<Table, Statement>();
  private readonly finish: Statement;
  private readonly observations: Row[] = [];

  constructor(db: Database) {
    this.finish = db.prepare(`UPDATE "syringe_releases" SET "status" = 'finished', "rowVersion" = "rowVersion" + 1 WHERE "id" = ?`);
    for (const [table, columns] of Object.entries(TABLES) as [Table, readonly string[]][]) {
      const sql = `INSERT INTO "${table}" (${columns.map((c) => `"${c}"`).join(', ')}) VALUES (${columns.map((c) => `@${c}`).join(', ')})`;
      this.statements.set(table, db.prepare(sql));
    }
  }

  insert(table: Table, row: Row): number {
    const result = this.statements.get(table)!.run(row);
    this.counts.set(table, (this.counts.get(table) ?? 0) + 1);
    return Number(result.lastInsertRowid);
  }

  /**
   * Observations are held back and written in time order by `flushObservations`, as a ward
   * writes them (every running PCA's hourly rows interleaved), so the table's layout on disk is a
   * real one rather than one order's month in a row.
   */
  deferObservation(row: Row): void {
    this.observations.push(row);
  }

  flushObservations(): void {
    this.observations.sort((a, b) => (a.at! < b.at! ? -1 : a.at! > b.at! ? 1 : 0));
    for (const row of this.observations) this.insert('observations', row);
    this.observations.length = 0;
  }

  /** A syringe's status is only known once its story is written: it was taken down. */
  finishRelease(id: number): void {
    this.finish.run(id);
  }
}
