import { InitialSchema1764650000000 } from './1764650000000-initial-schema.js';
import { DoseLimitLibrary1764660000000 } from './1764660000000-dose-limit-library.js';
import { OrdersAndReleases1764670000000 } from './1764670000000-orders-and-releases.js';
import { BedsideChecks1764680000000 } from './1764680000000-bedside-checks.js';
import { Observations1764690000000 } from './1764690000000-observations.js';
import { ObservationVitals1764790000000 } from './1764790000000-observation-vitals.js';
import { Handover1764700000000 } from './1764700000000-handover.js';
import { AuditTrail1764710000000 } from './1764710000000-audit-trail.js';
import { OrderListsByPrescriber1764729000000 } from './1764729000000-order-lists-by-prescriber.js';
import { RevokedTokens1764739000000 } from './1764739000000-revoked-tokens.js';
import { PatientRecord1764750000000 } from './1764750000000-patient-record.js';
import { LibraryIntegrity1764760000000 } from './1764760000000-library-integrity.js';
import { RulePopulation1764770000000 } from './1764770000000-rule-population.js';
import { EquianalgesicFactors1764780000000 } from './1764780000000-equianalgesic-factors.js';
import { WardPolicySignOff1764810000000 } from './1764810000000-ward-policy-sign-off.js';
import { NaloxoneAndPause1764800000000 } from './1764800000000-naloxone-and-pause.js';
import { WardPolicyChanges1764820000000 } from './1764820000000-ward-policy-changes.js';
import { WardCloseObservation1764830000000 } from './1764830000000-ward-close-observation.js';
import { WardPopulation1764840000000 } from './1764840000000-ward-population.js';
import { FlagObservation1764850000000 } from './1764850000000-flag-observation.js';
import { IdempotencyKeys1764860000000 } from './1764860000000-idempotency-keys.js';

/** In order. Listed explicitly (not globbed) so tests and the built server run the same set. */
export const MIGRATIONS = [
  InitialSchema1764650000000,
  DoseLimitLibrary1764660000000,
  OrdersAndReleases1764670000000,
  BedsideChecks1764680000000,
  Observations1764690000000,
  Handover1764700000000,
  AuditTrail1764710000000,
  OrderListsByPrescriber1764729000000,
  RevokedTokens1764739000000,
  PatientRecord1764750000000,
  LibraryIntegrity1764760000000,
  RulePopulation1764770000000,
  EquianalgesicFactors1764780000000,
  ObservationVitals1764790000000,
  NaloxoneAndPause1764800000000,
  WardPolicySignOff1764810000000,
  WardPolicyChanges1764820000000,
  WardCloseObservation1764830000000,
  WardPopulation1764840000000,
  FlagObservation1764850000000,
  IdempotencyKeys1764860000000,
];
