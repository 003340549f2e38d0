/** A reference as the miner parses it from a reference list. */
export interface ParsedReference {
  raw: string;
  /** As written, e.g. "Okafor, T. B." or "T. B. Okafor" or a corporate author. */
  authors: readonly string[];
  year: string | null;
  title: string | null;
  doi: string | null;
  container?: string | null;
  kind?: string;
}

/** A work the reference may resolve to, as stored in the works table. */
export interface WorkCandidate {
  id: string;
  doi: string | null;
  title: string | null;
  /** The first author as stored; any of the forms firstAuthorSurname reads. */
  firstAuthor: string | null;
  year: string | null;
}

export interface Resolution {
  id: string;
  method: "doi" | "title";
  score: number;
}
