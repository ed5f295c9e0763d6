import { Alert, Button, Text } from '@mantine/core';
import { IconAlertCircle, IconShieldCheck, IconShieldX } from '@tabler/icons-react';
import type { AuditVerifyResult } from '@lockstep/shared';
import { errorMessage } from '@/lib/api-error';
import type { useVerifyAuditChain } from '@/api/audit/verify-audit-chain';

type VerifyChain = ReturnType<typeof useVerifyAuditChain>;

export function VerifyChainButton({ verify }: { verify: VerifyChain }) {
  return (
    <Button
      variant="default"
      leftSection={<IconShieldCheck size={16} aria-hidden />}
      loading={verify.isPending}
      onClick={() => verify.mutate()}
    >
      Verify chain
    </Button>
  );
}

function ChainResult({ result }: { result: AuditVerifyResult }) {
  if (result.ok) {
    return (
      <Alert
        color="green"
        variant="light"
        icon={<IconShieldCheck aria-hidden />}
        role="status"
        title={`All ${result.checked} events verified`}
      >
        <Text size="sm">Every event still carries the hash it was written with, and each links to the one before.</Text>
      </Alert>
    );
  }
  return (
    <Alert
      color="red"
      variant="light"
      icon={<IconShieldX aria-hidden />}
      role="alert"
      title={result.firstBadId === null ? 'The chain is broken' : `The chain breaks at event #${result.firstBadId}`}
    >
      <Text size="sm">
        That event, or its link to the one before, no longer matches what was written, so events from there on cannot be relied on as
        recorded. Report it to whoever looks after Lockstep's server. {result.checked} events before it were verified.
      </Text>
    </Alert>
  );
}

/** What the last check of the hash chain found; nothing before the first check. */
export function VerifyChainResult({ verify }: { verify: VerifyChain }) {
  if (verify.isSuccess) return <ChainResult result={verify.data} />;
  if (verify.isError) {
    return (
      <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} role="alert" title="The chain could not be checked">
        <Text size="sm">{errorMessage(verify.error)}</Text>
      </Alert>
    );
  }
  return null;
}
