import type { ColumnType, Generated } from "kysely";
import type {
  Comparator,
  Framing,
  ReferenceKind,
  SourceCheckVerdict,
  StatisticKey,
  TrailEnd,
  WorkType,
  WorkTypeDecider,
} from "@/lib/vocabulary";

type Timestamp = ColumnType<Date, Date | string, Date | string>;

export type { SourceCheckVerdict, TrailEnd, WorkType };

export interface WorkTable {
  id: Generated<string>;
  doi: string | null;
  title: string | null;
  normalised_title: string | null;
  first_author: string | null;
  year: string | null;
  kind: Generated<ReferenceKind>;
  work_type: Generated<WorkType>;
  type_decided_by: Generated<WorkTypeDecider>;
  article_id: string | null;
  merged_into: string | null;
  created_at: Generated<Timestamp>;
}
export interface PracticeTable {
  id: Generated<string>;
  key: string;
  label: string;
  statistic: StatisticKey;
  comparator: Comparator;
  value: number;
  framing: Framing | null;
  is_seeded: Generated<boolean>;
  created_by: string | null;
  created_at: Generated<Timestamp>;
}
export interface StatementPracticeTable {
  statement_id: string;
  practice_id: string;
}
export interface TrailTable {
  statement_id: string;
  practice_id: string;
  end_kind: TrailEnd;
  length: number;
  supported: SourceCheckVerdict | null;
  steps: ColumnType<unknown, string, string>;
  built_at: Generated<Timestamp>;
}
export interface SourceCheckTable {
  id: Generated<string>;
  work_id: string;
  practice_id: string;
  verdict: SourceCheckVerdict;
  page: string | null;
  quote: string | null;
  stated_value: number | null;
  checked_by: string | null;
  checked_at: Generated<Timestamp>;
}
