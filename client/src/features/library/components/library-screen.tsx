import { useState } from 'react';
import { Alert, Button, Group, Select, Stack, Title } from '@mantine/core';
import { IconAlertCircle, IconCopyPlus, IconFileImport } from '@tabler/icons-react';
import { useSearchParams } from 'react-router-dom';
import type { Drug, LibraryVersion, LibraryVersionDetail, Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { DecisionSupportNote } from '@/components/ui/decision-support-note';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { useCurrentUser } from '@/lib/auth/use-session';
import { notifySuccess } from '@/lib/notify';
import { useCreateDraft } from '@/api/library/create-draft';
import { useLibraryVersions } from '@/api/library/get-library-versions';
import { chooseWardId, parseId } from '../utils/library-selection';
import { ImportModal } from './import-modal';
import { VersionPanel } from './version-panel';
import { VersionsTable } from './versions-table';

export interface LibraryScreenProps {
  wards: Ward[];
  wardsLoading: boolean;
  drugs: Drug[];
}

/** The pharmacist's dose-limit library: a ward's versions, one version's rules and changes, and the actions on them. */
export function LibraryScreen({ wards, wardsLoading, drugs }: LibraryScreenProps) {
  const user = useCurrentUser();
  // Ward and version live in the address, so a reload or a shared link shows the same thing.
  const [searchParams, setSearchParams] = useSearchParams();
  const wardId = chooseWardId(parseId(searchParams.get('ward')), wards);
  const versionId = parseId(searchParams.get('version'));
  const ward = wards.find((candidate) => candidate.id === wardId);
  const versionsQuery = useLibraryVersions(wardId);
  const versions = versionsQuery.data ?? [];
  const createDraft = useCreateDraft();
  // One key per draft started here: a double-click or a retry starts one draft.
  const draftKey = useIdempotencyKey();
  const [draftRefusal, setDraftRefusal] = useState<string | null>(null);
  const [importing, setImporting] = useState(false);

  const select = (next: { wardId: number; versionId: number | null }) => {
    setDraftRefusal(null);
    setSearchParams(
      (previous) => {
        const params = new URLSearchParams(previous);
        params.set('ward', String(next.wardId));
        if (next.versionId === null) params.delete('version');
        else params.set('version', String(next.versionId));
        return params;
      },
      { replace: true },
    );
  };

  const currentVersionId = versionId ?? versions.find((version) => version.status === 'active')?.id ?? null;

  const startDraft = () => {
    if (wardId === null) return;
    setDraftRefusal(null);
    createDraft.mutate(
      { request: { wardId }, idempotencyKey: draftKey.key },
      {
        onSuccess: (draft) => {
          draftKey.renew();
          notifySuccess(
            'Draft started',
            `Version ${draft.number} of ${draft.wardName}'s library is a draft copied from the active version.`,
          );
          select({ wardId: draft.wardId, versionId: draft.id });
        },
        onError: (error) => setDraftRefusal(errorMessage(error)),
      },
    );
  };

  return (
    <Stack gap="md">
      <Title order={1}>Dose-limit library</Title>
      <Group justify="space-between" align="flex-end" wrap="wrap">
        <Select
          label="Ward"
          data={wards.map((w) => ({ value: String(w.id), label: w.name }))}
          value={wardId === null ? null : String(wardId)}
          onChange={(value) => value && select({ wardId: Number(value), versionId: null })}
          allowDeselect={false}
          disabled={wardsLoading}
          w={240}
        />
        <Group gap="sm">
          <Button
            variant="default"
            leftSection={<IconFileImport size={16} aria-hidden />}
            onClick={() => setImporting(true)}
            disabled={wardId === null}
          >
            Import CSV
          </Button>
          <Button
            leftSection={<IconCopyPlus size={16} aria-hidden />}
            onClick={startDraft}
            loading={createDraft.isPending}
            disabled={wardId === null}
          >
            New draft
          </Button>
        </Group>
      </Group>

      {draftRefusal ? (
        <Alert
          color="red"
          variant="light"
          icon={<IconAlertCircle aria-hidden />}
          title="No new draft was started"
          withCloseButton
          onClose={() => setDraftRefusal(null)}
          role="alert"
        >
          {draftRefusal}
        </Alert>
      ) : null}

      <Stack gap="xs">
        <Title order={2}>Versions{ward ? ` for ${ward.name}` : ''}</Title>
        {versionsQuery.isError ? (
          <QueryErrorAlert
            title="The versions could not be loaded"
            error={versionsQuery.error}
            onRetry={() => void versionsQuery.refetch()}
          />
        ) : (
          <VersionsTable
            versions={versions}
            isLoading={versionsQuery.isPending}
            currentVersionId={currentVersionId}
            onOpen={(version: LibraryVersion) => wardId !== null && select({ wardId, versionId: version.id })}
          />
        )}
      </Stack>

      {wardId !== null ? (
        <VersionPanel
          wardId={wardId}
          versionId={versionId}
          drugs={drugs}
          currentUserId={user.id}
          weightBased={ward?.weightBasedDosing ?? false}
          onDiscarded={() => select({ wardId, versionId: null })}
        />
      ) : null}
      <DecisionSupportNote />

      {importing && wardId !== null ? (
        <ImportModal
          wards={wards}
          initialWardId={wardId}
          onClose={() => setImporting(false)}
          onImported={(draft: LibraryVersionDetail) => select({ wardId: draft.wardId, versionId: draft.id })}
        />
      ) : null}
    </Stack>
  );
}
