import { Alert, Anchor, Paper, SimpleGrid, Stack, Text } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { CROSS_TOLERANCE_CAUTION, formatDose, NO_CONVERSION_FACTOR, withoutFloatNoise, type UsageResponse } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { describeProjectedEmpty } from '../utils/usage-display';

function Figure({ label, value, detail }: { label: string; value: string; detail?: string }) {
  return (
    <Paper withBorder radius="md" p="sm">
      <Text component="dt" size="sm" c="dimmed">
        {label}
      </Text>
      <Text component="dd" m={0} fz="xl" fw={700} className="tabular-nums">
        {value}
      </Text>
      {detail ? (
        <Text size="xs" c="dimmed" className="tabular-nums">
          {detail}
        </Text>
      ) : null}
    </Paper>
  );
}

/** The figures a nurse or prescriber reads first; each dose through formatDose. */
export function UsageFigures({ usage, now }: { usage: UsageResponse; now: Date }) {
  const unit = usage.doseUnit;
  const windowDose = withoutFloatNoise(usage.totals.dose + usage.totals.bolusDose);
  const factors = usage.oralMorphineFactors;
  return (
    <Stack gap="sm">
      <SimpleGrid cols={{ base: 1, xs: 2, lg: 4 }} spacing="sm" component="dl" m={0} aria-label="Usage figures">
        <Figure label="Last 24 hours" value={formatDose(usage.rolling24hDose, unit)} detail="Rolling total, PCA and clinician boluses" />
        <Figure
          label={`Last ${usage.hours} hours`}
          value={formatDose(windowDose, unit)}
          detail={`${usage.totals.attempts} attempts, ${usage.totals.delivered} delivered${usage.totals.bolusDose > 0 ? `, boluses ${formatDose(usage.totals.bolusDose, unit)}` : ''}`}
        />
        <Figure
          label="Average per hour"
          value={formatDose(usage.averageDosePerHour, `${unit}/h`)}
          detail={`Over the last ${usage.hours} hours`}
        />
        <Figure label="Syringe projected empty" {...describeProjectedEmpty(usage.projectedEmptyAt, now)} />
      </SimpleGrid>
      <Alert color="gray" variant="light" icon={<IconInfoCircle aria-hidden />} title="Oral morphine equivalent of the last 24 hours">
        <Text fz="lg" fw={700} className="tabular-nums" data-testid="oral-morphine-equivalent">
          {usage.oralMorphineEquivalent24hMg === null ? NO_CONVERSION_FACTOR : formatDose(usage.oralMorphineEquivalent24hMg, 'mg')}
        </Text>
        {factors ? (
          <Text size="sm" data-testid="oral-morphine-factors">
            Using {formatDose(factors.parenteralAmount, factors.parenteralUnit)} parenteral ≈ 10 mg parenteral morphine (
            {factors.parenteralSource}) and 10 mg parenteral morphine ≈ {formatDose(factors.oralMorphineMg, 'mg')} oral morphine (
            {factors.oralSource}).{' '}
            <Anchor component={Link} to={paths.equianalgesicFactors.getHref()} size="sm">
              Pharmacy&apos;s equianalgesic table
            </Anchor>
          </Text>
        ) : null}
        <Text size="sm">{CROSS_TOLERANCE_CAUTION}</Text>
      </Alert>
    </Stack>
  );
}
