import { Alert, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconAdjustments } from '@tabler/icons-react';
import { LOCAL_POLICY_CAUTION, type Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useWardPolicy } from '@/api/wards/get-ward-policy';
import { WardPolicyChanges } from './ward-policy-changes';
import { WardPolicyForm } from './ward-policy-form';

export interface WardPolicyScreenProps {
  wards: readonly Ward[];
  wardsLoading: boolean;
  /** The ward chosen (from the address); null shows the first. */
  wardId: number | null;
  onWardChange: (wardId: number) => void;
}

/** The admin's screen for each ward's monitoring and escalation settings. */
export function WardPolicyScreen({ wards, wardsLoading, wardId, onWardChange }: WardPolicyScreenProps) {
  const ward = wards.find((candidate) => candidate.id === wardId) ?? wards[0] ?? null;
  const policy = useWardPolicy(ward?.id ?? null);

  let body;
  if (wardsLoading) body = <Skeleton height={480} />;
  else if (!ward) body = <Text>No wards yet.</Text>;
  else if (policy.isError)
    body = <QueryErrorAlert title="The policy could not be loaded" error={policy.error} onRetry={() => void policy.refetch()} />;
  else if (!policy.data) body = <Skeleton height={480} aria-label="Loading the policy" />;
  // Keyed by ward so that moving to another ward starts from that ward's saved values.
  else {
    body = (
      <>
        <WardPolicyForm key={ward.id} wardId={ward.id} wardName={ward.name} policy={policy.data} />
        <WardPolicyChanges wardId={ward.id} />
      </>
    );
  }

  return (
    <Stack gap="lg" maw={760}>
      <Title order={1}>Ward policies</Title>
      <Alert color="lagoon" variant="light" icon={<IconAdjustments aria-hidden />} title="Local settings">
        These values are this ward&apos;s own policy: observation intervals, the thresholds that raise flags, when a syringe counts as low
        and the tolerance for reconciliation. {LOCAL_POLICY_CAUTION} Each value shows the default Lockstep shipped with.
      </Alert>
      <Select
        label="Ward"
        data={wards.map((candidate) => ({ value: String(candidate.id), label: candidate.name }))}
        value={ward ? String(ward.id) : null}
        onChange={(value) => value && onWardChange(Number(value))}
        allowDeselect={false}
        maw={320}
        disabled={wardsLoading}
      />
      {body}
    </Stack>
  );
}
