// A dose-limit library is a few dozen rows; a file this large is something else.
export const MAX_LIBRARY_CSV_BYTES = 1024 * 1024;

/** Said both by the import's own check and when the upload stops at the limit. */
export const FILE_TOO_LARGE = 'The file is over 1 MB; a dose-limit library CSV is far smaller';
