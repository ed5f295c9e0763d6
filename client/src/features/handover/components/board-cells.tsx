import type { ReactNode } from 'react';
import { Anchor, Group, Stack, Text, VisuallyHidden } from '@mantine/core';
import { IconAlertTriangle, IconClock, IconHourglassLow, IconQuestionMark } from '@tabler/icons-react';
import {
  atOrOverLimit,
  drugAndConcentration,
  FLAG_SEVERITY_LABELS,
  formatDose,
  formatRegimen,
  type HandoverRow,
  isAcceptableSedation,
  ORDER_STATUS_LABELS,
  SEDATION_DESCRIPTIONS,
} from '@lockstep/shared';
import { Link } from 'react-router-dom';
import { ALLERGY_SEVERITY_LOOK } from '@/components/ui/allergy-list';
import { PausedBadge } from '@/components/ui/paused-badge';
import { SeverityLabel } from '@/components/ui/severity-label';
import { paths } from '@/config/paths';
import { formatNearTime } from '@/utils/clock';
import { formatElapsed } from '@/utils/duration';
import { hasOpenFlags, rowSeverity } from '../utils/board-filters';
import { allergyLines, lastFourHours, patientFacts } from '../utils/board-format';

// The board's cells, shared by the live table and the printed sheet. Each says in words what it
// shows, so a cell read on its own (or on paper) needs no colour to be understood.

const Dimmed = ({ children }: { children: ReactNode }) => (
  <Text size="xs" c="dimmed">
    {children}
  </Text>
);

/** The bed, then the row's severity in words: the first thing a scanning eye meets. */
export function BedCell({ row }: { row: HandoverRow }) {
  return (
    <Stack gap={2}>
      <Text size="md" fw={700} style={{ whiteSpace: 'nowrap' }}>
        {row.bed}
      </Text>
      <SeverityLabel severity={rowSeverity(row)} size="xs" />
    </Stack>
  );
}

/** The patient, the name linking to the order's PCA page. */
export function PatientCell({ patient, orderId }: { patient: HandoverRow['patient']; orderId: number }) {
  return (
    <Stack gap={0}>
      <Anchor component={Link} to={paths.pca.getHref(orderId)} size="sm" fw={600} aria-label={`${patient.name}: open the PCA page`}>
        {patient.name}
      </Anchor>
      <Dimmed>
        MRN {patient.mrn} · {patientFacts(patient)}
      </Dimmed>
      <PatientAllergies patient={patient} />
    </Stack>
  );
}

/** Each allergy on its own line with its severity as icon and word; anaphylaxis in bold red; an empty record says so. */
function PatientAllergies({ patient }: { patient: HandoverRow['patient'] }) {
  return (
    <Stack gap={0} aria-label="Allergies">
      {allergyLines(patient).map(({ text, severity }) => {
        const look = severity ? ALLERGY_SEVERITY_LOOK[severity] : null;
        const Icon = look?.Icon ?? (patient.noKnownAllergies ? null : IconQuestionMark);
        return (
          <Group key={text} gap={4} wrap="nowrap" data-severity={severity ?? undefined}>
            {Icon ? (
              <Icon size={12} aria-hidden color={`var(--mantine-color-${look?.color ?? 'orange'}-7)`} style={{ flex: 'none' }} />
            ) : null}
            <Text
              size="xs"
              fw={severity === 'anaphylaxis' ? 700 : 500}
              c={severity === 'anaphylaxis' ? 'red.8' : severity ? undefined : 'dimmed'}
            >
              {text}
            </Text>
          </Group>
        );
      })}
    </Stack>
  );
}

/** Drug, regimen, and how long it has run (or the status that keeps it from running); Paused as icon and word. */
export function PcaCell({ row, now }: { row: HandoverRow; now: Date }) {
  const started =
    row.status === 'active' && row.startedAt !== null && row.minutesSinceStart !== null
      ? `${row.paused ? 'Started' : 'Running'} ${formatElapsed(row.minutesSinceStart)}${row.paused ? ' ago' : ''} (from ${formatNearTime(row.startedAt, now)})`
      : `${ORDER_STATUS_LABELS[row.status]} · not started`;
  return (
    <Stack gap={0}>
      <Text size="sm" fw={600}>
        {drugAndConcentration(row)}
      </Text>
      {row.paused ? (
        <div>
          <PausedBadge size="sm" />
        </div>
      ) : null}
      <Text size="xs">{formatRegimen({ ...row, ...row.regimen }, { withDrug: false })}</Text>
      <Dimmed>{started}</Dimmed>
    </Stack>
  );
}

export function LastObservationCell({ observation, now }: { observation: HandoverRow['lastObservation']; now: Date }) {
  if (!observation) return <Dimmed>None yet</Dimmed>;
  const acceptable = isAcceptableSedation(observation.sedationLevel);
  return (
    <Stack gap={0}>
      <Text size="sm">{formatNearTime(observation.at, now)}</Text>
      <Text size="xs" style={{ whiteSpace: 'nowrap' }}>
        Pain {observation.painScore} ·{' '}
        <Text span inherit fw={acceptable ? 400 : 700} title={SEDATION_DESCRIPTIONS[observation.sedationLevel]}>
          {acceptable ? null : <IconAlertTriangle size={12} aria-hidden style={{ verticalAlign: '-2px', marginRight: 2 }} />}
          Sedation {observation.sedationLevel}
          {acceptable ? null : <VisuallyHidden> (unacceptable)</VisuallyHidden>}
        </Text>
      </Text>
      <Text size="xs" style={{ whiteSpace: 'nowrap' }}>
        RR {observation.respiratoryRate} · SpO2 {observation.spo2} %
      </Text>
    </Stack>
  );
}

export function NextObservationCell({ next, now }: { next: HandoverRow['nextObservation']; now: Date }) {
  if (!next) return <Dimmed>—</Dimmed>;
  if (next.overdueMinutes > 0) {
    const late = formatElapsed(next.overdueMinutes);
    return (
      <Stack gap={0}>
        {next.severity === 'urgent' ? (
          <SeverityLabel severity="urgent" detail={`· ${late} overdue`} />
        ) : (
          <SeverityLabel severity="review" word="Overdue" detail={late} />
        )}
        <Dimmed>was due {formatNearTime(next.dueAt, now)}</Dimmed>
      </Stack>
    );
  }
  return (
    <Group gap={4} wrap="nowrap">
      <IconClock size={16} aria-hidden />
      <Text size="sm">Due {formatNearTime(next.dueAt, now)}</Text>
    </Group>
  );
}

/** The last 4 hours (attempts / delivered · dose) over the rolling 24-hour total. */
export function UsageCell({ row }: { row: HandoverRow }) {
  return (
    <Stack gap={0}>
      <Text size="sm" style={{ whiteSpace: 'nowrap' }}>
        <Text span size="xs" c="dimmed">
          4 h{' '}
        </Text>
        {lastFourHours(row)}
      </Text>
      {row.regimen.fourHourLimit !== null && atOrOverLimit(row.last4h.dose, row.regimen.fourHourLimit) ? (
        <Group gap={4} wrap="nowrap" c="red.9">
          <IconAlertTriangle size={14} aria-hidden />
          <Text size="xs" fw={600} c="inherit">
            At or over the 4-hour limit of {formatDose(row.regimen.fourHourLimit, row.doseUnit)}
          </Text>
        </Group>
      ) : null}
      <Text size="sm" style={{ whiteSpace: 'nowrap' }}>
        <Text span size="xs" c="dimmed">
          24 h{' '}
        </Text>
        {formatDose(row.total24hDose, row.doseUnit)}
      </Text>
    </Stack>
  );
}

export function SyringeCell({ syringe, now }: { syringe: HandoverRow['syringe']; now: Date }) {
  if (syringe.remainingMl === null) return <Dimmed>No syringe running</Dimmed>;
  return (
    <Stack gap={0}>
      <Text size="sm">{formatDose(syringe.remainingMl, 'mL')} left</Text>
      {syringe.projectedEmptyAt ? <Dimmed>empty about {formatNearTime(syringe.projectedEmptyAt, now)}</Dimmed> : null}
      {syringe.emptiesThisShift ? (
        <Group gap={4} wrap="nowrap" c="orange.9">
          <IconHourglassLow size={14} aria-hidden />
          <Text size="xs" fw={600} c="inherit">
            Empties this shift
          </Text>
        </Group>
      ) : null}
    </Stack>
  );
}

export function FlagsCell({ flags }: { flags: HandoverRow['flags'] }) {
  if (!hasOpenFlags({ flags })) return <Dimmed>None open</Dimmed>;
  return (
    // The messages on hover, for a reader who wants more than the counts.
    <Stack gap={2} title={flags.open.map((flag) => `${FLAG_SEVERITY_LABELS[flag.severity]}: ${flag.message}`).join('\n')}>
      {flags.urgent > 0 ? <SeverityLabel severity="urgent" detail={String(flags.urgent)} /> : null}
      {flags.review > 0 ? <SeverityLabel severity="review" detail={String(flags.review)} /> : null}
      {flags.info > 0 ? <SeverityLabel severity="info" detail={String(flags.info)} /> : null}
    </Stack>
  );
}
