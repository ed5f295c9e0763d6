import { useMutation } from '@tanstack/react-query';
import type { LibraryVersion } from '@lockstep/shared';
import { apiDownload, saveFile } from '@/lib/api-transfer';

/** Fetches the version as CSV with the session's token and hands it to the browser to save. */
export async function exportLibraryVersion(version: Pick<LibraryVersion, 'id' | 'number' | 'wardName'>): Promise<string> {
  const file = await apiDownload(
    `/library/versions/${version.id}/export`,
    `dose-limits-${version.wardName.toLowerCase()}-v${version.number}.csv`,
  );
  saveFile(file);
  return file.filename;
}

export function useExportLibraryVersion() {
  return useMutation({ mutationFn: exportLibraryVersion });
}
