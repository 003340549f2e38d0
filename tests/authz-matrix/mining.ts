import type { MatrixRow } from "./types";

// Upload, articles, statements, procedures (the mining feature).
export const miningRows: MatrixRow[] = [];
