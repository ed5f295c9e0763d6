import { Group, Stack, Text } from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { IconFileTypeCsv, IconUpload, IconX } from '@tabler/icons-react';
import { MAX_IMPORT_BYTES, rejectionMessage } from '../utils/import-problems';

export interface ImportDropzoneProps {
  onFile: (file: File) => void;
  onRejected: (messages: string[]) => void;
  busy: boolean;
  /** Shorter once a file has been checked, to leave room for the results. */
  compact?: boolean;
}

// Browsers give a .csv file different types (text/csv, application/vnd.ms-excel, none at all):
// the extension decides, and the server checks the content.
const ACCEPT = { 'text/csv': ['.csv'], 'application/vnd.ms-excel': ['.csv'], 'text/plain': ['.csv'] };

export function ImportDropzone({ onFile, onRejected, busy, compact = false }: ImportDropzoneProps) {
  const onReject = (rejections: FileRejection[]) =>
    onRejected([
      ...new Set(
        rejections.map(({ file, errors }) =>
          rejectionMessage(
            file.name,
            file.size,
            errors.map((error) => error.code),
          ),
        ),
      ),
    ]);

  return (
    <Dropzone
      onDrop={(files) => {
        if (files[0]) onFile(files[0]);
      }}
      onReject={onReject}
      accept={ACCEPT}
      maxSize={MAX_IMPORT_BYTES}
      multiple={false}
      disabled={busy}
      inputProps={{ 'aria-label': 'CSV file to import' }}
    >
      <Group justify="center" gap="lg" mih={compact ? 64 : 120} style={{ pointerEvents: 'none' }}>
        <Dropzone.Accept>
          <IconUpload size={40} stroke={1.5} aria-hidden color="var(--mantine-primary-color-filled)" />
        </Dropzone.Accept>
        <Dropzone.Reject>
          <IconX size={40} stroke={1.5} aria-hidden color="var(--mantine-color-red-6)" />
        </Dropzone.Reject>
        <Dropzone.Idle>
          <IconFileTypeCsv size={compact ? 28 : 40} stroke={1.5} aria-hidden color="var(--mantine-color-dimmed)" />
        </Dropzone.Idle>
        <Stack gap={2}>
          <Text size={compact ? 'sm' : 'md'} fw={500}>
            {compact ? 'Drop a corrected file here, or click to choose one' : 'Drop the CSV file here, or click to choose it'}
          </Text>
          <Text size="xs" c="dimmed">
            One .csv file of at most 1 MB, with the columns of an exported library. Nothing is saved until you confirm.
          </Text>
        </Stack>
      </Group>
    </Dropzone>
  );
}
