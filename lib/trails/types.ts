import { TRAIL_ENDS, type TrailEnd as VocabularyTrailEnd, type WorkType as VocabularyWorkType } from "@/lib/vocabulary";

export type WorkType = VocabularyWorkType;

export interface TrailWork {
  id: string;
  type: WorkType;
  /** The corpus article this work is, or null for a work outside the corpus. */
  articleId: string | null;
  year: number | string | null;
}

export interface TrailCitation {
  citationId: string;
  /** null: the reference behind this in-text citation did not resolve to a work. */
  workId: string | null;
  locator: string | null;
  /** Second-hand ("as cited in"). */
  secondary: boolean;
}

export interface PracticeStatementRef {
  statementId: string;
  citations: readonly TrailCitation[];
}

export interface TrailStart extends PracticeStatementRef {
  articleId: string;
}

type MaybePromise<T> = T | Promise<T>;

/**
 * What the trail builder needs from the database, in batches so a whole-corpus build costs one
 * query per level of the citation graph rather than one per work. Either method may be sync or async.
 */
export interface TrailGraph {
  /** The works with these ids; an id left out is treated as an unresolved reference. */
  getWorks(workIds: readonly string[]): MaybePromise<Iterable<TrailWork>>;
  /**
   * For each article id, its statements that assert the practice (after practice matching). An
   * article left out of the map, or mapped to [], does not assert the practice.
   */
  statementsOfPractice(
    articleIds: readonly string[],
    practiceId: string,
  ): MaybePromise<ReadonlyMap<string, readonly PracticeStatementRef[]>>;
}

/**
 * Where a trail ends:
 * - methods_source: a work typed as a methods source (not followed further, even if it is in the corpus);
 * - empirical_precedent: an empirical work that does not assert the practice (in the corpus or not);
 * - unclassified: a resolved work whose type nobody has set yet; kept apart so an unknown book is
 *   never counted as empirical precedent;
 * - unresolved: a citation whose reference did not resolve to a work;
 * - no_citation: a statement in the chain that cites nothing — the claim rests on nothing;
 * - cycle: a citation back to an article already on the current path;
 * - depth_limit: the chain went on past opts.maxDepth.
 */
export type TrailEndKind = VocabularyTrailEnd;

/** Order used for the summary end: the firmest footing the claim reaches comes first (the vocabulary's order). */
export const END_PRIORITY: readonly TrailEndKind[] = TRAIL_ENDS;

export interface TrailEnd {
  kind: TrailEndKind;
  /** Citation hops from the start statement (0 = the start statement itself cites nothing). Shortest over all paths. */
  depth: number;
  workId?: string;
  citationId?: string;
  statementId?: string;
}

export interface TrailSummary {
  statementId: string;
  practiceId: string;
  /** Distinct ends (one per kind and work/citation/statement), by END_PRIORITY then depth. */
  ends: TrailEnd[];
  /** Longest path in citation hops. */
  length: number;
  /** The first of `ends`: the firmest footing reached (see END_PRIORITY). */
  summaryEnd: TrailEnd;
}

export type TrailNode =
  | { id: string; kind: "statement"; statementId: string; articleId: string; depth: number }
  | {
      id: string;
      kind: "work";
      workId: string;
      type: WorkType;
      articleId: string | null;
      year: number | string | null;
      depth: number;
    }
  | { id: string; kind: "unresolved"; citationId: string; workId: string | null; depth: number };

export type TrailEdge =
  | { from: string; to: string; kind: "cites"; citationId: string; locator: string | null; secondary: boolean }
  | { from: string; to: string; kind: "asserted_in" };

export interface Trail extends TrailSummary {
  nodes: TrailNode[];
  edges: TrailEdge[];
}

export interface TrailOptions {
  /** Citation hops followed before a chain is cut with a depth_limit end. Default 100. */
  maxDepth?: number;
}
