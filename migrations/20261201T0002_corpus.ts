import { sql, type Kysely } from "kysely";

// The corpus: venues, stored files (by SHA-256), articles and what the miner found in them.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create table venues (
      id uuid primary key default gen_random_uuid(),
      name text not null,
      abbreviation text,
      issn text,
      is_methods_venue boolean not null default false,
      is_demo boolean not null default false,
      created_at timestamptz not null default now()
    );
    create unique index venues_name_lower on venues (lower(name));

    create table editor_venues (
      user_id uuid not null references "User"(id) on delete cascade,
      venue_id uuid not null references venues(id) on delete cascade,
      primary key (user_id, venue_id)
    );

    create table stored_files (
      sha256 text primary key check (sha256 ~ '^[0-9a-f]{64}$'),
      size_bytes bigint not null,
      media_type text not null,
      storage_key text not null,
      created_at timestamptz not null default now()
    );

    create table upload_batches (
      id uuid primary key default gen_random_uuid(),
      created_by uuid references "User"(id) on delete set null,
      file_count int not null default 0,
      created_at timestamptz not null default now()
    );

    create table articles (
      id uuid primary key default gen_random_uuid(),
      file_sha256 text not null unique references stored_files(sha256),
      original_filename text not null,
      source_kind text not null check (source_kind in ('pdf','jats','text')),
      venue_id uuid references venues(id) on delete set null,
      year int check (year between 1800 and 2100),
      doi text,
      title text,
      authors jsonb not null default '[]',
      licence text,
      status text not null default 'uploaded'
        check (status in ('uploaded','queued','reading','mining','done','failed')),
      failure_code text,
      failure_message text,
      pages int,
      document_meta jsonb not null default '{}',
      miner_version text,
      mined_at timestamptz,
      uploaded_by uuid references "User"(id) on delete set null,
      upload_batch_id uuid references upload_batches(id) on delete set null,
      is_demo boolean not null default false,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create unique index articles_doi_lower on articles (lower(doi)) where doi is not null;
    create index articles_venue_year on articles (venue_id, year);
    create index articles_status on articles (status);
    create index articles_batch on articles (upload_batch_id);

    create table statements (
      id uuid primary key default gen_random_uuid(),
      article_id uuid not null references articles(id) on delete cascade,
      ordinal int not null,
      page int,
      section text not null check (section in ('methods','results','discussion','introduction','other','unknown')),
      sentence text not null,
      kind text not null check (kind in ('threshold','reported','procedure')),
      statistic text,
      comparator text check (comparator in ('>=','>','<=','<','=')),
      value double precision,
      framing text check (framing in ('fixed','contextual')),
      procedure_key text,
      sourcing text not null default 'unsourced'
        check (sourcing in ('unsourced','cited_no_locator','cited_with_locator','secondary_only')),
      -- Stable across re-mining: hash of the normalised sentence, kind and statistic, so reviews re-attach.
      fingerprint text not null,
      unique (article_id, ordinal)
    );
    create index statements_article on statements (article_id);
    create index statements_fingerprint on statements (article_id, fingerprint);
    create index statements_kind_statistic on statements (kind, statistic);

    create table "references" (
      id uuid primary key default gen_random_uuid(),
      article_id uuid not null references articles(id) on delete cascade,
      ordinal int not null,
      raw text not null,
      authors jsonb not null default '[]',
      year text,
      title text,
      container text,
      doi text,
      kind text not null default 'other' check (kind in ('book','chapter','article','other')),
      work_id uuid,
      unique (article_id, ordinal)
    );
    create index references_work on "references" (work_id);
    create index references_doi on "references" (lower(doi));

    create table citations (
      id uuid primary key default gen_random_uuid(),
      article_id uuid not null references articles(id) on delete cascade,
      ordinal int not null,
      page int,
      sentence text not null,
      authors text not null,
      year text,
      locator text,
      secondary boolean not null default false,
      reference_id uuid references "references"(id) on delete set null,
      unique (article_id, ordinal)
    );
    create index citations_article on citations (article_id);
    create index citations_reference on citations (reference_id);

    create table statement_citations (
      statement_id uuid not null references statements(id) on delete cascade,
      citation_id uuid not null references citations(id) on delete cascade,
      primary key (statement_id, citation_id)
    );
    create index statement_citations_citation on statement_citations (citation_id);

    -- Curator reviews survive re-mining: they hang on (article, fingerprint), not on a statement row.
    create table statement_reviews (
      id uuid primary key default gen_random_uuid(),
      article_id uuid not null references articles(id) on delete cascade,
      fingerprint text not null,
      reviewer_id uuid not null references "User"(id) on delete cascade,
      verdict text not null check (verdict in ('correct','incorrect','corrected')),
      corrected jsonb,
      note text,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      unique (article_id, fingerprint, reviewer_id)
    );

    -- The curated, editable list of known misdescribed procedures the miner looks for.
    create table procedure_patterns (
      id uuid primary key default gen_random_uuid(),
      key text not null unique,
      label text not null,
      description text not null,
      all_of jsonb not null default '[]',
      any_of jsonb not null default '[]',
      none_of jsonb not null default '[]',
      enabled boolean not null default true,
      updated_by uuid references "User"(id) on delete set null,
      updated_at timestamptz not null default now()
    );
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop table procedure_patterns, statement_reviews, statement_citations, citations, "references", statements, articles, upload_batches, stored_files, editor_venues, venues`.execute(
    db,
  );
}
