import { useState } from 'react';
import { Alert, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { CROSS_TOLERANCE_CAUTION } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useDrugs } from '@/api/drugs/get-drugs';
import { canAccess } from '@/config/navigation';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useEquianalgesicFactors } from '../api/get-equianalgesic-factors';
import { EditFactorModal } from './edit-factor-modal';
import { drugsWithoutFactor } from '../utils/factor-display';
import type { FactorTarget } from '../utils/factor-form';
import { FactorsTable } from './factors-table';

/** Pharmacy's equianalgesic table: read by everyone who sees an oral-morphine figure, changed by a pharmacist. */
export function EquianalgesicScreen() {
  const user = useCurrentUser();
  const factors = useEquianalgesicFactors();
  const drugs = useDrugs();
  const [editing, setEditing] = useState<FactorTarget | null>(null);
  const canEdit = canAccess(user.role, 'pharmacy');

  let body;
  if (factors.isError) {
    body = <QueryErrorAlert title="The factors could not be loaded" error={factors.error} onRetry={() => void factors.refetch()} />;
  } else if (!factors.data) {
    body = <Skeleton height={240} aria-label="Loading the factors" />;
  } else {
    body = (
      <FactorsTable
        factors={factors.data}
        missing={drugsWithoutFactor(drugs.data ?? [], factors.data)}
        canEdit={canEdit}
        onEdit={setEditing}
        onSet={(drug) => setEditing({ drugId: drug.id, genericName: drug.genericName, route: 'parenteral', unit: drug.doseUnit })}
      />
    );
  }

  return (
    <Stack gap="lg">
      <Title order={1}>Equianalgesic factors</Title>
      <Alert color="gray" variant="light" icon={<IconInfoCircle aria-hidden />} title="How the oral-morphine figure is computed">
        <Text size="sm">
          A PCA&apos;s 24-hour total, as oral morphine for planning the step down, uses its drug&apos;s row below and the oral morphine row.
          Published equianalgesic tables vary; these are pharmacy&apos;s choice, each with the source that states it. A drug with no row
          shows no figure.
        </Text>
        <Text size="sm" mt="xs">
          {CROSS_TOLERANCE_CAUTION}
        </Text>
      </Alert>
      {body}
      {editing ? <EditFactorModal factor={editing} onClose={() => setEditing(null)} /> : null}
    </Stack>
  );
}
