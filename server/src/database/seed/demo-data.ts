import type { DoseUnit, Sex } from '@lockstep/shared';

// Everything here is invented for the demo: the hospital, wards, people and values.

export const DEMO_HOSPITAL = 'Kestrel Bay Hospital';

const wardMail = (ward: string) => ({
  pharmacyEmail: `pharmacy.${ward}@kestrelbay.example`,
  nurseInChargeEmail: `nurse-in-charge.${ward}@kestrelbay.example`,
});

export const DEMO_WARDS = [
  { code: 'HAR', name: 'Harbour', specialty: 'General surgery', weightBasedDosing: false, ...wardMail('harbour') },
  { code: 'CED', name: 'Cedar', specialty: 'Orthopaedics', weightBasedDosing: false, ...wardMail('cedar') },
  { code: 'WRE', name: 'Wren', specialty: 'Paediatrics', weightBasedDosing: true, ...wardMail('wren') },
  { code: 'SUM', name: 'Summit', specialty: 'High dependency', weightBasedDosing: false, ...wardMail('summit') },
];

export const DEMO_DRUGS: { genericName: string; doseUnit: DoseUnit }[] = [
  { genericName: 'morphine', doseUnit: 'mg' },
  { genericName: 'hydromorphone', doseUnit: 'mg' },
  { genericName: 'fentanyl', doseUnit: 'mcg' },
];

export interface DemoPatient {
  mrn: string;
  givenName: string;
  familyName: string;
  dateOfBirth: string;
  sex: Sex;
  weightKg: number | null;
  allergies: string;
  opioidTolerant: boolean;
  sleepApnoea: boolean;
  otherSedatives: boolean;
  wardCode: string;
  bed: string;
}

const none = { opioidTolerant: false, sleepApnoea: false, otherSedatives: false };

export const DEMO_PATIENTS: DemoPatient[] = [
  { mrn: 'KB100231', givenName: 'Noah', familyName: 'Achterberg', dateOfBirth: '1968-03-14', sex: 'male', weightKg: 82, allergies: 'No known drug allergies', ...none, wardCode: 'HAR', bed: 'H02' },
  { mrn: 'KB100458', givenName: 'Ines', familyName: 'Valdivia', dateOfBirth: '1951-11-02', sex: 'female', weightKg: 61, allergies: 'Penicillin (rash)', ...none, sleepApnoea: true, wardCode: 'HAR', bed: 'H05' },
  { mrn: 'KB100672', givenName: 'Tavita', familyName: 'Faleolo', dateOfBirth: '1979-07-28', sex: 'male', weightKg: 118, allergies: 'No known drug allergies', ...none, opioidTolerant: true, wardCode: 'HAR', bed: 'H07' },
  { mrn: 'KB100819', givenName: 'Margit', familyName: 'Lindqvist', dateOfBirth: '1944-01-19', sex: 'female', weightKg: 54, allergies: 'Codeine (vomiting)', ...none, otherSedatives: true, wardCode: 'HAR', bed: 'H11' },
  { mrn: 'KB101127', givenName: 'Dev', familyName: 'Raghunathan', dateOfBirth: '1990-09-05', sex: 'male', weightKg: 74, allergies: 'No known drug allergies', ...none, wardCode: 'CED', bed: 'C03' },
  { mrn: 'KB101364', givenName: 'Oluwaseun', familyName: 'Bakare', dateOfBirth: '1957-05-23', sex: 'female', weightKg: 88, allergies: 'Latex', ...none, sleepApnoea: true, otherSedatives: true, wardCode: 'CED', bed: 'C08' },
  { mrn: 'KB101590', givenName: 'Hamish', familyName: 'Colquhoun', dateOfBirth: '1983-12-30', sex: 'male', weightKg: 95, allergies: 'No known drug allergies', ...none, opioidTolerant: true, wardCode: 'CED', bed: 'C10' },
  { mrn: 'KB102015', givenName: 'Aroha', familyName: 'Tane', dateOfBirth: '2014-04-11', sex: 'female', weightKg: 38, allergies: 'No known drug allergies', ...none, wardCode: 'WRE', bed: 'W01' },
  { mrn: 'KB102248', givenName: 'Felix', familyName: 'Okonkwo-Brandt', dateOfBirth: '2018-08-17', sex: 'male', weightKg: 24.5, allergies: 'Ibuprofen (wheeze)', ...none, wardCode: 'WRE', bed: 'W04' },
  { mrn: 'KB102391', givenName: 'Saoirse', familyName: 'Quill', dateOfBirth: '2011-02-06', sex: 'female', weightKg: 47, allergies: 'No known drug allergies', ...none, sleepApnoea: true, wardCode: 'WRE', bed: 'W06' },
  { mrn: 'KB103102', givenName: 'Bartholomew', familyName: 'Ng', dateOfBirth: '1949-10-09', sex: 'male', weightKg: 70, allergies: 'Morphine (itch, not anaphylaxis)', ...none, otherSedatives: true, wardCode: 'SUM', bed: 'S01' },
  { mrn: 'KB103355', givenName: 'Yelena', familyName: 'Marchetti', dateOfBirth: '1972-06-21', sex: 'female', weightKg: 66, allergies: 'No known drug allergies', ...none, opioidTolerant: true, sleepApnoea: true, wardCode: 'SUM', bed: 'S04' },
  // Added after the first twelve, so those keep their ids.
  { mrn: 'KB100905', givenName: 'Ezra', familyName: 'Whitlock', dateOfBirth: '1975-02-11', sex: 'male', weightKg: 79, allergies: 'No known drug allergies', ...none, wardCode: 'HAR', bed: 'H03' },
  { mrn: 'KB100936', givenName: 'Sunniva', familyName: 'Haldorsen', dateOfBirth: '1962-08-30', sex: 'female', weightKg: 68, allergies: 'Penicillin (rash)', ...none, wardCode: 'HAR', bed: 'H08' },
  { mrn: 'KB100947', givenName: 'Kwame', familyName: 'Asante-Boateng', dateOfBirth: '1958-12-03', sex: 'male', weightKg: 91, allergies: 'No known drug allergies', ...none, wardCode: 'HAR', bed: 'H09' },
  { mrn: 'KB100958', givenName: 'Mateo', familyName: 'Quintero', dateOfBirth: '1986-05-19', sex: 'male', weightKg: 84, allergies: 'No known drug allergies', ...none, opioidTolerant: true, wardCode: 'HAR', bed: 'H12' },
  { mrn: 'KB100969', givenName: 'Ottilie', familyName: 'Fenwick', dateOfBirth: '1990-01-25', sex: 'female', weightKg: 63, allergies: 'Latex', ...none, wardCode: 'HAR', bed: 'H04' },
  { mrn: 'KB100971', givenName: 'Bogdan', familyName: 'Lisowski', dateOfBirth: '1971-04-08', sex: 'male', weightKg: 77, allergies: 'No known drug allergies', ...none, wardCode: 'HAR', bed: 'H01' },
  { mrn: 'KB100983', givenName: 'Amaru', familyName: 'Condori', dateOfBirth: '1998-10-14', sex: 'male', weightKg: 70, allergies: 'No known drug allergies', ...none, wardCode: 'HAR', bed: 'H06' },
  { mrn: 'KB101412', givenName: 'Yusra', familyName: 'Haddad', dateOfBirth: '1969-07-02', sex: 'female', weightKg: 72, allergies: 'No known drug allergies', ...none, wardCode: 'CED', bed: 'C05' },
  { mrn: 'KB103410', givenName: 'Ilse', familyName: 'Brandvold', dateOfBirth: '1980-03-27', sex: 'female', weightKg: 59, allergies: 'Ibuprofen (wheeze)', ...none, wardCode: 'SUM', bed: 'S02' },
];
