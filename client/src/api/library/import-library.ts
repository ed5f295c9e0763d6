import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  importPreviewSchema,
  libraryVersionDetailSchema,
  type ImportLibraryFields,
  type ImportPreview,
  type LibraryVersionDetail,
} from '@lockstep/shared';
import { apiUpload } from '@/lib/api-transfer';
import { libraryKeys } from './library-keys';

/** The multipart body's text fields (`dryRun` is set by the call) and the file. */
export type ImportLibraryInput = Pick<ImportLibraryFields, 'wardId' | 'note'> & { file: File; onProgress?: (fraction: number) => void };

function importForm({ wardId, file, note }: ImportLibraryInput, dryRun: boolean): FormData {
  const form = new FormData();
  form.append('wardId', String(wardId));
  if (note?.trim()) form.append('note', note.trim());
  if (dryRun) form.append('dryRun', 'true');
  // The file goes last: the server reads the text fields before the upload arrives.
  form.append('file', file, file.name);
  return form;
}

/** Checks the file and previews its rules and diff; nothing is written. 400 lists every problem. */
export function previewLibraryImport(input: ImportLibraryInput): Promise<ImportPreview> {
  return apiUpload('/library/import', importForm(input, true), { schema: importPreviewSchema, onProgress: input.onProgress });
}

/** The file becomes a new draft of the ward's library (409 while the ward has an open version). */
export function importLibrary(input: ImportLibraryInput): Promise<LibraryVersionDetail> {
  return apiUpload('/library/import', importForm(input, false), { schema: libraryVersionDetailSchema, onProgress: input.onProgress });
}

export function usePreviewLibraryImport() {
  return useMutation({ mutationFn: previewLibraryImport });
}

export function useImportLibrary() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importLibrary,
    onSuccess: (draft) => {
      queryClient.setQueryData(libraryKeys.versionDetail(draft.id), draft);
      return queryClient.invalidateQueries({ queryKey: libraryKeys.versionList(draft.wardId) });
    },
  });
}
