import type { ReactNode } from 'react';
import { Alert, Group, Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconArrowBackUp, IconInfoCircle } from '@tabler/icons-react';
import { DECISION_SUPPORT_CAUTION, type OrderDetail } from '@lockstep/shared';
import { ruleLabel } from '../utils/regimen-format';
import { DerivedValues } from './derived-values';
import { OrderFindings } from './order-findings';
import { OrderHistory } from './order-history';
import { RegimenTable } from './regimen-table';
import { ReleasesTable } from './releases-table';

export interface OrderReviewProps {
  order: OrderDetail;
  /** The version this one revises, with its history (the pharmacist's query). */
  previous: OrderDetail | null;
  weightKg: number | null;
  canPrint: boolean;
  /** A "Release syringe" button beside the releases, for pharmacy. */
  releaseAction?: ReactNode;
  /**
   * The order's whole story (from the audit trail), shown in place of the status history: it
   * holds every status change and more, so the page never shows two histories.
   */
  story?: ReactNode;
}

function Section({ title, children, aside }: { title: string; children: ReactNode; aside?: ReactNode }) {
  const id = `section-${title.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`;
  return (
    <Paper withBorder radius="md" p="md" component="section" aria-labelledby={id}>
      <Stack gap="sm">
        <Group justify="space-between" align="center">
          <Title order={2} id={id}>
            {title}
          </Title>
          {aside}
        </Group>
        {children}
      </Stack>
    </Paper>
  );
}

/** An order read in full: against its limit rule, what it means, what was found, its history. */
export function OrderReview({ order, previous, weightKg, canPrint, releaseAction, story }: OrderReviewProps) {
  const ruleText = order.rule
    ? `Limits of ${ruleLabel(order.rule)}, from the ward's library when the order was signed.`
    : 'No limit rule: the ward library had none for this drug and concentration.';
  // The query that sent the previous version back, so the revision can be read against it.
  const query = previous?.events.findLast((event) => event.toStatus === 'returned')?.reason ?? null;
  return (
    <Stack gap="md">
      {query && previous ? (
        <Alert
          color="grape"
          variant="light"
          icon={<IconArrowBackUp aria-hidden />}
          title={`Query on version ${previous.version} (order ${previous.id})`}
        >
          <Text size="sm">{query}</Text>
        </Alert>
      ) : null}
      <Section title="Regimen against the limit rule">
        <Text size="sm" c="dimmed">
          {ruleText}
          {previous ? ` Values that differ from version ${previous.version} (order ${previous.id}) are marked “Changed”.` : ''}
        </Text>
        <RegimenTable order={order} previous={previous} weightKg={weightKg} caption="Regimen against the limit rule" />
      </Section>
      <SimpleGrid cols={{ base: 1, md: 2 }} spacing="md">
        <Section title="Volumes and maximum doses">
          <DerivedValues derived={order.derived} doseUnit={order.doseUnit} />
          <Alert color="blue" variant="light" icon={<IconInfoCircle aria-hidden />} p="xs">
            <Text size="xs">{DECISION_SUPPORT_CAUTION}</Text>
          </Alert>
        </Section>
        <Section title="Findings and reasons">
          <OrderFindings findings={order.findings} overrides={order.overrides} />
        </Section>
      </SimpleGrid>
      <Section title="Syringe releases" aside={releaseAction}>
        <ReleasesTable releases={order.releases} canPrint={canPrint} />
      </Section>
      {story ? (
        <Section title="Order story">{story}</Section>
      ) : (
        <Section title="Status history">
          <OrderHistory events={order.events} />
        </Section>
      )}
    </Stack>
  );
}
