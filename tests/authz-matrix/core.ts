import { type MatrixRow } from "./types";

// Pages and handlers of the foundation: landing, sign-in, home, admin.
export const coreRows: MatrixRow[] = [];
