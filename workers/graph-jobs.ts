import type { JobDefinition } from "./job-types";

// Jobs of the citation-graph feature (reference resolution, practice matching, trails, summaries).
// Filled by that feature; the mining job sends to "resolve-article" with { articleId } after it commits.
export const graphJobs: JobDefinition[] = [];
