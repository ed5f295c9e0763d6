import { Alert, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconAdjustments } from '@tabler/icons-react';
import { LOCAL_POLICY_CAUTION, type Ward, type WardPolicySettings } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { wardKindLabel } from '@/utils/ward-kind';
import { useWardPolicy } from '@/api/wards/get-ward-policy';
import { useWardPolicyChanges } from '@/api/ward-policy-changes/get-ward-policy-changes';
import { DeclinedPolicyChange } from './declined-policy-change';
import { PendingPolicyChange } from './pending-policy-change';
import { WardPolicyChanges } from './ward-policy-changes';
import { WardPolicyForm } from './ward-policy-form';
import { POLICY_NUMBER_FIELDS } from '../utils/policy-form';

/** The ward's clinical settings (not its e-mail addresses, which save without resetting the form). */
function settingsKey(policy: WardPolicySettings): string {
  return JSON.stringify(POLICY_NUMBER_FIELDS.map((field) => policy[field.key]));
}

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
  // Every status, newest first: the change waiting, or else the last one declined with its reason.
  const changes = useWardPolicyChanges({ wardId: ward?.id }, { enabled: ward !== null });

  let body;
  if (wardsLoading) body = <Skeleton height={480} />;
  else if (!ward) body = <Text>No wards yet.</Text>;
  else if (policy.isError)
    body = <QueryErrorAlert title="The policy could not be loaded" error={policy.error} onRetry={() => void policy.refetch()} />;
  else if (changes.isError)
    body = <QueryErrorAlert title="Proposed changes could not be loaded" error={changes.error} onRetry={() => void changes.refetch()} />;
  else if (!policy.data || !changes.data) body = <Skeleton height={480} aria-label="Loading the policy" />;
  else {
    const ours = changes.data.filter((change) => change.wardId === ward.id);
    const waiting = ours.find((change) => change.status === 'pending') ?? null;
    const lastDecided = ours.find((change) => change.status !== 'pending') ?? null;
    body = (
      <>
        {waiting ? <PendingPolicyChange change={waiting} /> : null}
        {!waiting && lastDecided?.status === 'declined' ? <DeclinedPolicyChange change={lastDecided} /> : null}
        {/* Keyed by ward and its saved settings, so that moving to another ward, or a change signed off, starts
            the form from the values the ward now works to. */}
        <WardPolicyForm
          key={`${ward.id}:${settingsKey(policy.data)}`}
          wardId={ward.id}
          wardName={ward.name}
          policy={policy.data}
          pending={waiting}
        />
        <WardPolicyChanges wardId={ward.id} />
      </>
    );
  }

  return (
    <Stack gap="lg" maw={760}>
      <Title order={1}>Ward policies</Title>
      <Alert color="lagoon" variant="light" icon={<IconAdjustments aria-hidden />} title="Local settings">
        These values are this ward&apos;s own policy: observation intervals, the thresholds that raise flags, when a syringe counts as low
        and the tolerance for reconciliation. {LOCAL_POLICY_CAUTION} Each value shows the default Lockstep shipped with. A change is
        proposed with your signature and applies once a charge nurse or pharmacist signs it off; the e-mail addresses save at once.
      </Alert>
      <Select
        label="Ward"
        data={wards.map((candidate) => ({ value: String(candidate.id), label: candidate.name }))}
        value={ward ? String(ward.id) : null}
        description={wardKindLabel(ward) ?? undefined}
        onChange={(value) => value && onWardChange(Number(value))}
        allowDeselect={false}
        maw={320}
        disabled={wardsLoading}
      />
      {body}
    </Stack>
  );
}
