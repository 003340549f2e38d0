import { sql, type Kysely } from "kysely";

// One vocabulary (lib/vocabulary.ts), enforced by the database too:
// - framing gains `disputed` (a sentence that names a cut-off to argue against it);
// - statements and practices get a CHECK on the statistic key, which now includes the keys added to
//   the miner's closed vocabulary (f², Q², Cohen's d, first-stage F, tolerance, skewness, kurtosis,
//   minimum sample size);
// - statements keep the statistic's name as written when the key is `other` (statistic_label), so
//   curators can see which unlisted statistics are frequent.
// The lists are spelled out here on purpose: migrations never import today's code.
const KEYS = `'cronbach_alpha','mcdonald_omega','composite_reliability','ave','factor_loading','htmt','vif',
  'cfi','tli','rmsea','srmr','chi_square_df','kmo','eigenvalue','icc','cohen_kappa','p_value','r_squared',
  'item_total_correlation','sample_size_ratio','statistical_power','f_squared','q_squared','cohen_d',
  'first_stage_f','tolerance','skewness','kurtosis','minimum_sample_size','other'`;

export async function up(db: Kysely<unknown>): Promise<void> {
  await sql
    .raw(
      `
    alter table statements drop constraint statements_framing_check;
    alter table statements add constraint statements_framing_check check (framing in ('fixed','contextual','disputed'));
    alter table practices drop constraint practices_framing_check;
    alter table practices add constraint practices_framing_check check (framing in ('fixed','contextual','disputed'));
    alter table statements add constraint statements_statistic_check check (statistic in (${KEYS}));
    alter table practices add constraint practices_statistic_check check (statistic in (${KEYS}));
    alter table statements add column statistic_label text
      check (statistic_label is null or (statistic = 'other' and length(statistic_label) between 1 and 120));
  `,
    )
    .execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql
    .raw(
      `
    alter table statements drop column statistic_label;
    alter table statements drop constraint statements_statistic_check;
    alter table practices drop constraint practices_statistic_check;
    delete from statements where framing = 'disputed';
    alter table statements drop constraint statements_framing_check;
    alter table statements add constraint statements_framing_check check (framing in ('fixed','contextual'));
    alter table practices drop constraint practices_framing_check;
    alter table practices add constraint practices_framing_check check (framing in ('fixed','contextual'));
  `,
    )
    .execute(db);
}
