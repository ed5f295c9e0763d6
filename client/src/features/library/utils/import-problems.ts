import type { FieldError } from '@lockstep/shared';

/** The server's limit for a library CSV. */
export const MAX_IMPORT_BYTES = 1024 * 1024;

export interface ImportProblemRow {
  key: string;
  /** Spreadsheet row (the header is row 1); null for a problem with the whole file. */
  row: number | null;
  column: string | null;
  message: string;
}

/**
 * The problems of a refused file, row by row. The server words each as "Row 3, drug: …"; the
 * table shows row and column in their own columns, so that prefix is dropped from the message.
 */
export function importProblemRows(errors: readonly FieldError[]): ImportProblemRow[] {
  return errors
    .map((error, index) => {
      const row = error.row ?? null;
      const column = error.column ?? null;
      const prefix = row !== null && column !== null ? `Row ${row}, ${column}: ` : null;
      const message = prefix && error.message.startsWith(prefix) ? error.message.slice(prefix.length) : error.message;
      return { key: `${index}`, row, column, message };
    })
    .sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
}

export function formatFileSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Why the drop zone refused a file, in words (codes are react-dropzone's). */
export function rejectionMessage(fileName: string, size: number, codes: readonly string[]): string {
  if (codes.includes('too-many-files')) return 'Drop one file at a time.';
  if (codes.includes('file-invalid-type')) return `${fileName} is not a CSV file. Choose a .csv file (comma-separated values).`;
  if (codes.includes('file-too-large')) return `${fileName} is ${formatFileSize(size)}; a library CSV can be at most 1 MB.`;
  return `${fileName} could not be used. Choose a .csv file of at most 1 MB.`;
}
