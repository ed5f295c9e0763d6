import type { ReactNode } from 'react';
import { DataList, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { ageInYears, hasAllergies, type Patient, patientDisplayName } from '@lockstep/shared';
import { formatCalendarDate } from '@/utils/format-date';
import { formatSex, formatWeight } from '../utils/patient-format';
import { RiskMarkers } from './risk-markers';

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
  return (
    <Stack gap="md">
      <Group gap="md" align="baseline" wrap="wrap">
        <Title order={1}>{patientDisplayName(patient)}</Title>
        <Text c="dimmed" className="tabular-nums">
          MRN {patient.mrn}
        </Text>
      </Group>

      <Paper withBorder p="md" radius="md">
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="xl">
          <DataList labelWidth="9rem" className="tabular-nums">
            <Fact label="Date of birth">
              {formatCalendarDate(patient.dateOfBirth)} ({age} {age === 1 ? 'year' : 'years'})
            </Fact>
            <Fact label="Sex">{formatSex(patient.sex)}</Fact>
            <Fact label="Ward and bed">
              {patient.wardName}, bed {patient.bed}
            </Fact>
          </DataList>
          <DataList labelWidth="9rem" className="tabular-nums">
            <Fact label="Weight">{formatWeight(patient.weightKg)}</Fact>
            <Fact label="Allergies">{hasAllergies(patient.allergies) ? patient.allergies : 'No known allergies'}</Fact>
          </DataList>
        </SimpleGrid>
      </Paper>

      <Stack gap="xs">
        <Title order={2}>Risk factors</Title>
        <RiskMarkers patient={patient} size="md" />
      </Stack>
    </Stack>
  );
}
