import { useState } from 'react';
import { Alert, Button, Group, List, Loader, Modal, Progress, Select, Stack, Text, Textarea } from '@mantine/core';
import { IconAlertCircle, IconFilePlus } from '@tabler/icons-react';
import type { ImportPreview, LibraryVersionDetail, Ward } from '@lockstep/shared';
import { errorMessage, isApiRequestError } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notify';
import { useImportLibrary, usePreviewLibraryImport } from '@/api/library/import-library';
import { importProblemRows, type ImportProblemRow } from '../utils/import-problems';
import { ImportDropzone } from './import-dropzone';
import { ImportPreviewView } from './import-preview-view';
import { ImportProblemsView } from './import-problems-view';

type Step =
  | { kind: 'choose' }
  | { kind: 'checking'; file: File }
  | { kind: 'problems'; file: File; message: string; problems: ImportProblemRow[] }
  | { kind: 'preview'; file: File; preview: ImportPreview };

export interface ImportModalProps {
  wards: Ward[];
  initialWardId: number;
  onClose: () => void;
  onImported: (draft: LibraryVersionDetail) => void;
}

/** CSV → checked preview (nothing written) → a new draft, on the pharmacist's confirmation. */
export function ImportModal({ wards, initialWardId, onClose, onImported }: ImportModalProps) {
  const [wardId, setWardId] = useState(initialWardId);
  const [note, setNote] = useState('');
  const [step, setStep] = useState<Step>({ kind: 'choose' });
  const [progress, setProgress] = useState(0);
  const [rejections, setRejections] = useState<string[]>([]);
  const previewImport = usePreviewLibraryImport();
  const importLibrary = useImportLibrary();
  const wardName = wards.find((ward) => ward.id === wardId)?.name ?? 'this ward';

  const check = (file: File, forWard = wardId) => {
    setRejections([]);
    setProgress(0);
    importLibrary.reset();
    setStep({ kind: 'checking', file });
    previewImport.mutate(
      { wardId: forWard, file, onProgress: setProgress },
      {
        onSuccess: (preview) => setStep({ kind: 'preview', file, preview }),
        onError: (error) => {
          const problems = isApiRequestError(error) ? importProblemRows(error.errors) : [];
          setStep({ kind: 'problems', file, message: errorMessage(error), problems });
        },
      },
    );
  };

  const changeWard = (value: string | null) => {
    const next = Number(value);
    if (!value || next === wardId) return;
    setWardId(next);
    // The diff is against this ward's active version: check the same file again for the new ward.
    if (step.kind === 'preview' || step.kind === 'problems') check(step.file, next);
  };

  const confirm = () => {
    if (step.kind !== 'preview') return;
    importLibrary.mutate(
      { wardId, file: step.file, note, onProgress: setProgress },
      {
        onSuccess: (draft) => {
          notifySuccess(
            'Draft created',
            `Version ${draft.number} of ${draft.wardName}'s library is a draft from ${step.file.name}. Submit it for approval when it is ready.`,
          );
          onImported(draft);
          onClose();
        },
      },
    );
  };

  const checking = step.kind === 'checking';
  return (
    <Modal opened onClose={onClose} title="Import dose limits from CSV" size="xl">
      <Stack gap="md">
        <Group align="flex-start" grow>
          <Select
            label="Ward"
            description="The file becomes a new draft of this ward's library"
            data={wards.map((ward) => ({ value: String(ward.id), label: ward.name }))}
            value={String(wardId)}
            onChange={changeWard}
            allowDeselect={false}
            disabled={checking || importLibrary.isPending}
          />
          <Textarea
            label="Note"
            description="Why the limits change (optional; shown to the approver)"
            value={note}
            onChange={(event) => setNote(event.currentTarget.value)}
            maxLength={1000}
            autosize
            minRows={1}
          />
        </Group>

        {step.kind === 'checking' ? (
          <Stack gap={6} role="status" aria-live="polite">
            <Group gap="xs">
              <Loader size="xs" aria-hidden />
              <Text size="sm">{progress < 1 ? `Uploading ${step.file.name}…` : `Checking ${step.file.name}…`}</Text>
            </Group>
            <Progress value={Math.max(5, Math.round(progress * 100))} animated striped aria-label="Upload progress" />
          </Stack>
        ) : (
          <ImportDropzone
            onFile={(file) => check(file)}
            onRejected={setRejections}
            busy={importLibrary.isPending}
            compact={step.kind !== 'choose'}
          />
        )}

        {rejections.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="That file cannot be used" role="alert">
            <List size="sm">
              {rejections.map((message) => (
                <List.Item key={message}>{message}</List.Item>
              ))}
            </List>
          </Alert>
        ) : null}
        {step.kind === 'problems' ? <ImportProblemsView fileName={step.file.name} message={step.message} problems={step.problems} /> : null}
        {step.kind === 'preview' ? <ImportPreviewView fileName={step.file.name} preview={step.preview} /> : null}
        {importLibrary.isError ? (
          <Alert color="red" variant="light" icon={<IconAlertCircle aria-hidden />} title="No draft was created" role="alert">
            {errorMessage(importLibrary.error)}
          </Alert>
        ) : null}

        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button
            leftSection={<IconFilePlus size={16} aria-hidden />}
            onClick={confirm}
            disabled={step.kind !== 'preview'}
            loading={importLibrary.isPending}
          >
            Create draft from this file
          </Button>
        </Group>
        {step.kind === 'preview' ? (
          <Text size="xs" c="dimmed" ta="right">
            The draft goes into {wardName}&apos;s library and needs a second pharmacist&apos;s approval before it is used.
          </Text>
        ) : null}
      </Stack>
    </Modal>
  );
}
