import type { ReactNode } from 'react';
import { Group, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { ageInYears, allergyStatus, isOpioidTolerant, opioidToleranceText, type Patient, patientDisplayName } from '@lockstep/shared';
import { AllergyList } from '@/components/ui/allergy-list';
import { formatSex, formatWeight, formatWeightDate, localToday } from '../utils/patient-format';

function Fact({ label, children, risk = false }: { label: string; children: ReactNode; risk?: boolean }) {
  return (
    <div>
      <Text size="xs" c="dimmed" fw={500}>
        {label}
      </Text>
      <Group gap={4} wrap="nowrap" align="flex-start">
        {/* A risk is marked by an icon and the word, not by colour alone. */}
        {risk ? (
          <IconAlertTriangle size={16} color="var(--mantine-color-orange-7)" aria-hidden style={{ marginTop: 3, flex: 'none' }} />
        ) : null}
        <Text size="sm" fw={risk ? 600 : 500} component="div">
          {children}
        </Text>
      </Group>
    </div>
  );
}

/**
 * The patient at the top of an order or verification screen: identity, and every factor that
 * shapes a PCA regimen (weight, age, opioid tolerance, sleep apnoea, other sedatives, allergies).
 */
export function PatientBanner({ patient }: { patient: Patient }) {
  const age = ageInYears(patient.dateOfBirth);
  const allergies = allergyStatus(patient);
  return (
    <Paper withBorder radius="md" p="md" component="section" aria-label="Patient" bg="var(--mantine-color-slate-0)">
      <Stack gap="sm">
        <Group gap="md" align="baseline" wrap="wrap">
          <Text fz="xl" fw={700} data-testid="patient-banner-name">
            {patientDisplayName(patient)}
          </Text>
          <Text c="dimmed" className="tabular-nums">
            MRN {patient.mrn}
          </Text>
          <Text c="dimmed">
            {age} {age === 1 ? 'year' : 'years'}, {formatSex(patient.sex).toLowerCase()}
          </Text>
        </Group>
        <SimpleGrid cols={{ base: 2, sm: 3, lg: 5 }} spacing="md" className="tabular-nums">
          <Fact label="Weight" risk={patient.weightKg === null || patient.weightMeasuredOn === null}>
            {formatWeight(patient.weightKg)}
            {patient.weightKg === null ? null : (
              <Text span size="xs" c="dimmed" display="block">
                {formatWeightDate(patient.weightMeasuredOn, localToday())}
              </Text>
            )}
          </Fact>
          <Fact label="Ward and bed">
            {patient.wardName}, bed {patient.bed}
          </Fact>
          <Fact label="Opioid tolerance" risk={patient.opioidTolerant && !isOpioidTolerant(patient)}>
            {opioidToleranceText(patient)}
          </Fact>
          <Fact label="Sleep apnoea" risk={patient.sleepApnoea}>
            {patient.sleepApnoea ? 'Yes' : 'No'}
          </Fact>
          <Fact label="Other sedatives" risk={patient.otherSedatives}>
            {patient.otherSedatives ? 'Yes' : 'No'}
          </Fact>
        </SimpleGrid>
        {/* Allergies get their own line: every entry, most severe first, anaphylaxis filled red. */}
        <Fact label="Allergies" risk={allergies !== 'no-known-allergies'}>
          <AllergyList patient={patient} />
        </Fact>
      </Stack>
    </Paper>
  );
}
