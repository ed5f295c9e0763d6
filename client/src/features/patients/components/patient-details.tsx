import type { ReactNode } from 'react';
import { DataList, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { ageInYears, PATIENT_RECORD_ROLES, type Patient, patientDisplayName, WEIGHT_ROLES } from '@lockstep/shared';
import { useCurrentUser } from '@/lib/auth/use-session';
import { formatCalendarDate } from '@/utils/format-date';
import { formatSex } from '../utils/patient-format';
import { AllergyEditor } from './allergy-editor';
import { RiskMarkers } from './risk-markers';
import { Spo2ScaleSection } from './spo2-scale-section';
import { ToleranceForm } from './tolerance-form';
import { WeightForm } from './weight-form';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <DataList.Item>
      <DataList.ItemLabel>{label}</DataList.ItemLabel>
      <DataList.ItemValue>{children}</DataList.ItemValue>
    </DataList.Item>
  );
}

/** The patient's identity and the facts that shape a PCA order, in one header. */
export function PatientDetails({ patient }: { patient: Patient }) {
  const age = ageInYears(patient.dateOfBirth);
  const { role } = useCurrentUser();
  const editsRecord = PATIENT_RECORD_ROLES.includes(role);
  return (
    <Stack gap="md">
      <Group gap="md" align="baseline" wrap="wrap">
        <Title order={1}>{patientDisplayName(patient)}</Title>
        <Text c="dimmed" className="tabular-nums">
          MRN {patient.mrn}
        </Text>
      </Group>

      <Paper withBorder p="md" radius="md">
        <DataList labelWidth="9rem" className="tabular-nums">
          <Fact label="Date of birth">
            {formatCalendarDate(patient.dateOfBirth)} ({age} {age === 1 ? 'year' : 'years'})
          </Fact>
          <Fact label="Sex">{formatSex(patient.sex)}</Fact>
          <Fact label="Ward and bed">
            {patient.wardName}, bed {patient.bed}
          </Fact>
        </DataList>
      </Paper>

      <Paper withBorder p="md" radius="md">
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="xl">
          <WeightForm
            key={`weight-${patient.weightKg}-${patient.weightMeasuredOn}`}
            patient={patient}
            canEdit={WEIGHT_ROLES.includes(role)}
          />
          <ToleranceForm
            key={`tolerance-${patient.toleranceOralMorphineMgPerDay}-${patient.toleranceDays}`}
            patient={patient}
            canEdit={editsRecord}
          />
        </SimpleGrid>
      </Paper>

      <Paper withBorder p="md" radius="md">
        <AllergyEditor patient={patient} canEdit={editsRecord} />
      </Paper>

      <Paper withBorder p="md" radius="md">
        <Spo2ScaleSection patient={patient} />
      </Paper>

      <Stack gap="xs">
        <Title order={2}>Risk factors</Title>
        <RiskMarkers patient={patient} size="md" />
      </Stack>
    </Stack>
  );
}
