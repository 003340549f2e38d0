import type { Migration } from "kysely";
import * as accounts from "./20261201T0001_accounts";
import * as corpus from "./20261201T0002_corpus";
import * as graph from "./20261201T0003_graph";
import * as people from "./20261201T0004_people";
import * as dashboardSummaries from "./20261201T1834_dashboard_summaries";
import * as uploadBatchMetadata from "./20261201T1842_upload_batch_metadata";
import * as dashboardRollups from "./20261201T1901_dashboard_rollups";
import * as dashboardFactCover from "./20261201T1906_dashboard_fact_cover";
import * as inVenueNotLater from "./20261201T2042_in_venue_precedent_not_later";
import * as referencePlacedByCurator from "./20261201T2043_reference_placed_by_curator";
import * as vocabularyChecks from "./20261202T1400_vocabulary_checks";

// Listed explicitly (no glob): the order here is the order they run. Append, never edit.
export const migrations: Record<string, Migration> = {
  "20261201T0001_accounts": accounts,
  "20261201T0002_corpus": corpus,
  "20261201T0003_graph": graph,
  "20261201T0004_people": people,
  "20261201T1834_dashboard_summaries": dashboardSummaries,
  "20261201T1842_upload_batch_metadata": uploadBatchMetadata,
  "20261201T1901_dashboard_rollups": dashboardRollups,
  "20261201T1906_dashboard_fact_cover": dashboardFactCover,
  "20261201T2042_in_venue_precedent_not_later": inVenueNotLater,
  "20261201T2043_reference_placed_by_curator": referencePlacedByCurator,
  "20261202T1400_vocabulary_checks": vocabularyChecks,
};
