import { sql, type Kysely } from "kysely";

// The citation graph (works), practices, trails and source checks.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create table works (
      id uuid primary key default gen_random_uuid(),
      doi text,
      title text,
      normalised_title text,
      first_author text,
      year text,
      kind text not null default 'other' check (kind in ('book','chapter','article','other')),
      work_type text not null default 'unknown' check (work_type in ('methods_source','empirical','unknown')),
      type_decided_by text not null default 'default' check (type_decided_by in ('default','venue','reference_kind','curator')),
      article_id uuid unique references articles(id) on delete set null,
      merged_into uuid references works(id) on delete set null,
      created_at timestamptz not null default now()
    );
    create unique index works_doi_lower on works (lower(doi)) where doi is not null and merged_into is null;
    create index works_block on works (first_author, year);
    alter table "references" add constraint references_work_fk foreign key (work_id) references works(id) on delete set null;

    create table practices (
      id uuid primary key default gen_random_uuid(),
      key text not null unique,
      label text not null,
      statistic text not null,
      comparator text not null check (comparator in ('>=','>','<=','<','=')),
      value double precision not null,
      framing text check (framing in ('fixed','contextual')),
      is_seeded boolean not null default false,
      created_by uuid references "User"(id) on delete set null,
      created_at timestamptz not null default now()
    );

    create table statement_practices (
      statement_id uuid not null references statements(id) on delete cascade,
      practice_id uuid not null references practices(id) on delete cascade,
      primary key (statement_id, practice_id)
    );
    create index statement_practices_practice on statement_practices (practice_id);

    create table trails (
      statement_id uuid not null references statements(id) on delete cascade,
      practice_id uuid not null references practices(id) on delete cascade,
      end_kind text not null check (end_kind in ('methods_source','empirical_precedent','unresolved','no_citation','cycle')),
      length int not null,
      supported text check (supported in ('says_so','says_otherwise','silent','not_checked')),
      steps jsonb not null,
      built_at timestamptz not null default now(),
      primary key (statement_id, practice_id)
    );
    create index trails_practice on trails (practice_id, end_kind);

    create table source_checks (
      id uuid primary key default gen_random_uuid(),
      work_id uuid not null references works(id) on delete cascade,
      practice_id uuid not null references practices(id) on delete cascade,
      verdict text not null check (verdict in ('says_so','says_otherwise','silent','not_checked')),
      page text,
      quote text,
      stated_value double precision,
      checked_by uuid references "User"(id) on delete set null,
      checked_at timestamptz not null default now(),
      unique (work_id, practice_id),
      check (verdict not in ('says_so','says_otherwise') or page is not null)
    );
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop table source_checks, trails, statement_practices, practices;
    alter table "references" drop constraint references_work_fk; drop table works`.execute(db);
}
