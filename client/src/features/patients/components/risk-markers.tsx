import type { ComponentType } from 'react';
import { Badge, Group, Text } from '@mantine/core';
import { IconAlertTriangle, IconMoonStars, IconPill, IconZzz, type IconProps } from '@tabler/icons-react';
import type { Patient } from '@lockstep/shared';
import { hasAllergies } from '../utils/patient-format';

interface RiskMarker {
  key: string;
  label: string;
  Icon: ComponentType<IconProps>;
  color: string;
  detail?: string;
}

/** The patient's risk markers, each with its own icon and word so colour is never the only cue. */
export function riskMarkersOf(patient: Patient): RiskMarker[] {
  const markers: RiskMarker[] = [];
  if (hasAllergies(patient.allergies)) {
    markers.push({ key: 'allergies', label: 'Allergies', Icon: IconAlertTriangle, color: 'red', detail: patient.allergies });
  }
  if (patient.opioidTolerant) markers.push({ key: 'opioid', label: 'Opioid tolerant', Icon: IconPill, color: 'indigo' });
  if (patient.sleepApnoea) markers.push({ key: 'apnoea', label: 'Sleep apnoea', Icon: IconZzz, color: 'orange' });
  if (patient.otherSedatives) {
    markers.push({ key: 'sedatives', label: 'Other sedatives', Icon: IconMoonStars, color: 'orange' });
  }
  return markers;
}

export interface RiskMarkersProps {
  patient: Patient;
  size?: 'sm' | 'md';
  /** In a table the allergy text is clipped to fit; on the patient page it is shown in full. */
  compact?: boolean;
}

export function RiskMarkers({ patient, size = 'sm', compact = false }: RiskMarkersProps) {
  const markers = riskMarkersOf(patient);
  if (markers.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        None recorded
      </Text>
    );
  }
  return (
    <Group gap={4} wrap={compact ? 'nowrap' : 'wrap'}>
      {markers.map(({ key, label, Icon, color, detail }) => {
        const text = detail ? `${label}: ${detail}` : label;
        return (
          <Badge
            key={key}
            size={size}
            color={color}
            variant="light"
            leftSection={<Icon size={size === 'sm' ? 12 : 14} aria-hidden />}
            title={text}
            maw={compact && detail ? 200 : undefined}
          >
            {text}
          </Badge>
        );
      })}
    </Group>
  );
}
