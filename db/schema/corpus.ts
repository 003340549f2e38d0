import type { ColumnType, Generated } from "kysely";
import type { MetadataEntry } from "@/lib/metadata";

type Timestamp = ColumnType<Date, Date | string, Date | string>;
type Json<T> = ColumnType<T, string, string>;

import type {
  ArticleStatus,
  Comparator,
  Framing,
  ReferenceKind,
  ReviewVerdict,
  Section,
  Sourcing,
  SourceKind,
  StatementKind,
  StatisticKey,
  WorkSetBy,
} from "@/lib/vocabulary";

// Enum columns take their types from lib/vocabulary.ts (one list per vocabulary).
export type { ArticleStatus, Comparator, Framing, ReferenceKind, Section, Sourcing, SourceKind, StatementKind };

export interface VenueTable {
  id: Generated<string>;
  name: string;
  abbreviation: string | null;
  issn: string | null;
  is_methods_venue: Generated<boolean>;
  is_demo: Generated<boolean>;
  created_at: Generated<Timestamp>;
}
export interface EditorVenueTable {
  user_id: string;
  venue_id: string;
}
export interface StoredFileTable {
  sha256: string;
  size_bytes: ColumnType<string, number | string, number | string>;
  media_type: string;
  storage_key: string;
  created_at: Generated<Timestamp>;
}
export interface UploadBatchTable {
  id: Generated<string>;
  created_by: string | null;
  file_count: Generated<number>;
  created_at: Generated<Timestamp>;
  /** The metadata file sent with the batch (migration 20261201T1842), and its parsed entries. */
  metadata_filename: ColumnType<string | null, string | null | undefined, string | null>;
  metadata_entries: ColumnType<MetadataEntry[], string | undefined, string>;
}
export interface ArticleTable {
  id: Generated<string>;
  file_sha256: string;
  original_filename: string;
  source_kind: SourceKind;
  venue_id: string | null;
  year: number | null;
  doi: string | null;
  title: string | null;
  authors: ColumnType<string[], string | undefined, string>;
  licence: string | null;
  status: Generated<ArticleStatus>;
  failure_code: string | null;
  failure_message: string | null;
  pages: number | null;
  document_meta: ColumnType<Record<string, unknown>, string | undefined, string>;
  miner_version: string | null;
  mined_at: Timestamp | null;
  uploaded_by: string | null;
  upload_batch_id: string | null;
  is_demo: Generated<boolean>;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}
export interface StatementTable {
  id: Generated<string>;
  article_id: string;
  ordinal: number;
  page: number | null;
  section: Section;
  sentence: string;
  kind: StatementKind;
  statistic: StatisticKey | null;
  /** The statistic's name as written, when `statistic` is `other`. */
  statistic_label: string | null;
  comparator: Comparator | null;
  value: number | null;
  framing: Framing | null;
  procedure_key: string | null;
  sourcing: Generated<Sourcing>;
  fingerprint: string;
}
export interface ReferenceTable {
  id: Generated<string>;
  article_id: string;
  ordinal: number;
  raw: string;
  authors: ColumnType<string[], string | undefined, string>;
  year: string | null;
  title: string | null;
  container: string | null;
  doi: string | null;
  kind: Generated<ReferenceKind>;
  work_id: string | null;
  /** "curator" when a merge or split put the reference on its work; re-resolution leaves those alone. */
  work_set_by: Generated<WorkSetBy>;
}
export interface CitationTable {
  id: Generated<string>;
  article_id: string;
  ordinal: number;
  page: number | null;
  sentence: string;
  authors: string;
  year: string | null;
  locator: string | null;
  secondary: Generated<boolean>;
  reference_id: string | null;
}
export interface StatementCitationTable {
  statement_id: string;
  citation_id: string;
}
export interface StatementReviewTable {
  id: Generated<string>;
  article_id: string;
  fingerprint: string;
  reviewer_id: string;
  verdict: ReviewVerdict;
  corrected: Json<Record<string, unknown>> | null;
  note: string | null;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}
export interface ProcedurePatternTable {
  id: Generated<string>;
  key: string;
  label: string;
  description: string;
  all_of: ColumnType<string[], string | undefined, string>;
  any_of: ColumnType<string[], string | undefined, string>;
  none_of: ColumnType<string[], string | undefined, string>;
  enabled: Generated<boolean>;
  updated_by: string | null;
  updated_at: Generated<Timestamp>;
}
