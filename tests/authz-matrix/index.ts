import { coreRows } from "./core";
import { miningRows } from "./mining";
import { graphRows } from "./graph";

// Listed explicitly: a feature's rows live in its own file.
export const MATRIX = [...coreRows, ...miningRows, ...graphRows];
export * from "./types";
