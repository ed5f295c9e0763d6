import { Drug } from '../drugs/entities/drug.entity.js';
import { LibraryVersion } from '../library/entities/library-version.entity.js';
import { LimitRule } from '../library/entities/limit-rule.entity.js';
import { Patient } from '../patients/entities/patient.entity.js';
import { User } from '../users/entities/user.entity.js';
import { Ward } from '../wards/entities/ward.entity.js';

/** Every entity, for the data source used outside Nest (migrations, reset, schema check). */
export const ENTITIES = [Ward, User, Patient, Drug, LibraryVersion, LimitRule];
