/** Largest file one upload may carry: the miner's own limit (lib/mining DEFAULT_MAX_BYTES, 50 MiB). */
export const UPLOAD_MAX_BYTES = 50 * 1024 * 1024;
/** Largest metadata file (BibTeX/RIS/CSV) sent with a batch. */
export const METADATA_MAX_BYTES = 5 * 1024 * 1024;
