import type { ComponentType } from 'react';
import { Badge, Group, Text } from '@mantine/core';
import {
  IconAlertOctagon,
  IconAlertTriangle,
  IconMoonStars,
  IconPill,
  IconQuestionMark,
  IconZzz,
  type IconProps,
} from '@tabler/icons-react';
import { allergiesSummary, type Patient, PATIENT_RISK_FACTOR_LABELS, type PatientRiskFactor, patientRiskFactors } from '@lockstep/shared';

interface RiskMarker {
  key: string;
  label: string;
  Icon: ComponentType<IconProps>;
  color: string;
  detail?: string;
}

const MARKER_LOOK: Record<PatientRiskFactor, Pick<RiskMarker, 'Icon' | 'color'>> = {
  anaphylaxis: { Icon: IconAlertOctagon, color: 'red' },
  allergies: { Icon: IconAlertTriangle, color: 'orange' },
  'allergies-not-recorded': { Icon: IconQuestionMark, color: 'gray' },
  'opioid-tolerant': { Icon: IconPill, color: 'indigo' },
  'sleep-apnoea': { Icon: IconZzz, color: 'orange' },
  'other-sedatives': { Icon: IconMoonStars, color: 'orange' },
};

/** The patient's risk markers (the shared list of risk factors), each with its own icon and word so colour is never the only cue. */
export function riskMarkersOf(patient: Patient): RiskMarker[] {
  return patientRiskFactors(patient).map((factor) => ({
    key: factor,
    label: PATIENT_RISK_FACTOR_LABELS[factor],
    ...MARKER_LOOK[factor],
    ...(factor === 'allergies' ? { detail: allergiesSummary(patient) } : {}),
  }));
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
            variant={key === 'anaphylaxis' ? 'filled' : 'light'}
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
