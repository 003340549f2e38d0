import type * as A from "./accounts";
import type * as C from "./corpus";
import type * as G from "./graph";
import type * as P from "./people";

export * from "./accounts";
export * from "./corpus";
export * from "./graph";
export * from "./people";

/** Every table Echoline reads or writes, keyed by its name in PostgreSQL. */
export interface Database {
  User: A.UserTable;
  Account: A.AccountTable;
  Session: A.SessionTable;
  VerificationToken: A.VerificationTokenTable;
  used_sign_in_links: A.UsedSignInLinkTable;
  invitations: A.InvitationTable;
  sign_in_attempts: A.SignInAttemptTable;
  audit_log: A.AuditLogTable;
  venues: C.VenueTable;
  editor_venues: C.EditorVenueTable;
  stored_files: C.StoredFileTable;
  upload_batches: C.UploadBatchTable;
  articles: C.ArticleTable;
  statements: C.StatementTable;
  references: C.ReferenceTable;
  citations: C.CitationTable;
  statement_citations: C.StatementCitationTable;
  statement_reviews: C.StatementReviewTable;
  procedure_patterns: C.ProcedurePatternTable;
  works: G.WorkTable;
  practices: G.PracticeTable;
  statement_practices: G.StatementPracticeTable;
  trails: G.TrailTable;
  source_checks: G.SourceCheckTable;
  screenings: P.ScreeningTable;
  casebooks: P.CasebookTable;
  casebook_items: P.CasebookItemTable;
  report_subscriptions: P.ReportSubscriptionTable;
  job_events: P.JobEventTable;
}
