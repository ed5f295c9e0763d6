import { useId, useState } from 'react';
import { Button, Group, Text } from '@mantine/core';
import {
  IconArrowBackUp,
  IconDownload,
  IconEdit,
  IconInfoCircle,
  IconMessageReply,
  IconSend,
  IconSignature,
  IconTrash,
} from '@tabler/icons-react';
import {
  canDoLibraryAction,
  LIBRARY_CONTRIBUTIONS,
  type Drug,
  type LibraryVersionAction,
  type LibraryVersionDetail,
} from '@lockstep/shared';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { errorMessage } from '@/lib/api-error';
import { notifyError, notifySuccess } from '@/lib/notify';
import { useExportLibraryVersion } from '@/api/library/export-library-version';
import { useWithdrawVersion } from '@/api/library/withdraw-version';
import { ApproveModal } from './approve-modal';
import { DiscardModal } from './discard-modal';
import { RulesEditorDrawer } from './rules-editor-drawer';
import { SendBackModal } from './send-back-modal';
import { SubmitModal } from './submit-modal';

/** Why the signed-in pharmacist may not approve or send back: they created, imported, edited or submitted it (the server refuses too). */
export function ownVersionReason(version: LibraryVersionDetail, userId: number): string | null {
  const did = LIBRARY_CONTRIBUTIONS.filter((kind) =>
    version.contributors.some((contributor) => contributor.userId === userId && contributor.action === kind),
  );
  if (did.length === 0 && version.authorId === userId) did.push('created');
  if (did.length === 0) return null;
  const words = did.length === 1 ? did[0] : `${did.slice(0, -1).join(', ')} and ${did[did.length - 1]}`;
  return `You ${words} this version; a pharmacist who did not approves it or sends it back`;
}

type OpenDialog = 'edit' | 'submit' | 'discard' | 'approve' | 'sendBack' | null;

export interface VersionActionsProps {
  version: LibraryVersionDetail;
  drugs: Drug[];
  currentUserId: number;
  /** New rules start per kg on a weight-based ward. */
  weightBased: boolean;
  onDiscarded: () => void;
}

/** What a pharmacist can do with this version, by its status. */
export function VersionActions({ version, drugs, currentUserId, weightBased, onDiscarded }: VersionActionsProps) {
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const close = () => setDialog(null);
  const reasonId = useId();
  const withdraw = useWithdrawVersion();
  // One key per withdrawal: a double-click or a retry withdraws once; renewed after it is done.
  const withdrawKey = useIdempotencyKey();
  const exportCsv = useExportLibraryVersion();
  const ownReason = ownVersionReason(version, currentUserId);
  const ownVersion = ownReason !== null;
  // What the version's status allows, by the same lifecycle table the server enforces.
  const can = (action: LibraryVersionAction) => canDoLibraryAction(action, version.status);

  const doWithdraw = () =>
    withdraw.mutate(
      { versionId: version.id, idempotencyKey: withdrawKey.key },
      {
        onSuccess: (draft) => {
          withdrawKey.renew();
          notifySuccess('Withdrawn to draft', `Version ${draft.number} is a draft again and can be edited.`);
        },
        onError: (error) => notifyError('Not withdrawn', errorMessage(error)),
      },
    );
  const doExport = () =>
    exportCsv.mutate(version, {
      onSuccess: (filename) => notifySuccess('CSV exported', `Saved as ${filename}.`),
      onError: (error) => notifyError('The CSV could not be exported', errorMessage(error)),
    });

  return (
    <>
      <Group gap="xs" wrap="wrap">
        {can('edit') ? (
          <Button leftSection={<IconEdit size={16} aria-hidden />} onClick={() => setDialog('edit')} disabled={drugs.length === 0}>
            Edit rules
          </Button>
        ) : null}
        {can('submit') ? (
          <Button variant="default" leftSection={<IconSend size={16} aria-hidden />} onClick={() => setDialog('submit')}>
            Submit for approval
          </Button>
        ) : null}
        {can('discard') ? (
          <Button variant="subtle" color="red" leftSection={<IconTrash size={16} aria-hidden />} onClick={() => setDialog('discard')}>
            Discard draft
          </Button>
        ) : null}
        {can('approve') ? (
          <Button
            leftSection={<IconSignature size={16} aria-hidden />}
            onClick={() => setDialog('approve')}
            disabled={ownVersion}
            aria-describedby={ownVersion ? reasonId : undefined}
          >
            Approve
          </Button>
        ) : null}
        {can('sendBack') && !ownVersion ? (
          <Button variant="default" leftSection={<IconMessageReply size={16} aria-hidden />} onClick={() => setDialog('sendBack')}>
            Send back with a comment
          </Button>
        ) : null}
        {can('withdraw') ? (
          <Button
            variant="default"
            leftSection={<IconArrowBackUp size={16} aria-hidden />}
            onClick={doWithdraw}
            loading={withdraw.isPending}
          >
            Withdraw to draft
          </Button>
        ) : null}
        <Button variant="default" leftSection={<IconDownload size={16} aria-hidden />} onClick={doExport} loading={exportCsv.isPending}>
          Export CSV
        </Button>
      </Group>
      {can('approve') && ownVersion ? (
        <Group gap={6} wrap="nowrap" mt={6}>
          <IconInfoCircle size={16} aria-hidden color="var(--mantine-color-dimmed)" />
          <Text id={reasonId} size="sm" c="dimmed">
            {ownReason}
          </Text>
        </Group>
      ) : null}

      {dialog === 'submit' ? <SubmitModal version={version} onClose={close} /> : null}
      {dialog === 'discard' ? <DiscardModal version={version} onClose={close} onDiscarded={onDiscarded} /> : null}
      {dialog === 'approve' ? <ApproveModal version={version} onClose={close} /> : null}
      {dialog === 'sendBack' ? <SendBackModal version={version} onClose={close} /> : null}
      <RulesEditorDrawer opened={dialog === 'edit'} onClose={close} version={version} drugs={drugs} weightBased={weightBased} />
    </>
  );
}
