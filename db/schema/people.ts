import type { ColumnType, Generated } from "kysely";
import type { ReportFrequency, ScreeningStatus } from "@/lib/vocabulary";

type Timestamp = ColumnType<Date, Date | string, Date | string>;

export interface ScreeningTable {
  id: Generated<string>;
  editor_id: string;
  venue_id: string | null;
  filename: string;
  status: Generated<ScreeningStatus>;
  failure_message: string | null;
  result: ColumnType<unknown, string | null, string | null> | null;
  created_at: Generated<Timestamp>;
  expires_at: Timestamp;
}
export interface CasebookTable {
  id: Generated<string>;
  owner_id: string;
  title: string;
  description: Generated<string>;
  share_token: string | null;
  created_at: Generated<Timestamp>;
  updated_at: Generated<Timestamp>;
}
export interface CasebookItemTable {
  id: Generated<string>;
  casebook_id: string;
  article_id: string;
  fingerprint: string;
  sentence: string;
  note: Generated<string>;
  position: number;
  added_at: Generated<Timestamp>;
}
export interface ReportSubscriptionTable {
  id: Generated<string>;
  user_id: string;
  venue_id: string;
  frequency: ReportFrequency;
  last_sent_at: Timestamp | null;
}
export interface JobEventTable {
  id: Generated<string>;
  article_id: string | null;
  job_name: string;
  state: string;
  message: string | null;
  at: Generated<Timestamp>;
}
