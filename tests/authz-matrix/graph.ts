import type { MatrixRow } from "./types";

// Works, practices, trails, source checks, dashboards (the citation-graph feature).
export const graphRows: MatrixRow[] = [];
