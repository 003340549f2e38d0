import { sql, type Kysely } from "kysely";

// What editors and instructors keep: private screenings, casebooks, e-mailed reports, and the
// bookkeeping of background jobs that the upload page shows as progress.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create table screenings (
      id uuid primary key default gen_random_uuid(),
      editor_id uuid not null references "User"(id) on delete cascade,
      venue_id uuid references venues(id) on delete set null,
      filename text not null,
      status text not null default 'queued' check (status in ('queued','mining','done','failed')),
      failure_message text,
      result jsonb,
      created_at timestamptz not null default now(),
      expires_at timestamptz not null
    );
    create index screenings_editor on screenings (editor_id, created_at desc);
    create index screenings_expiry on screenings (expires_at);

    create table casebooks (
      id uuid primary key default gen_random_uuid(),
      owner_id uuid not null references "User"(id) on delete cascade,
      title text not null,
      description text not null default '',
      share_token text unique,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );

    create table casebook_items (
      id uuid primary key default gen_random_uuid(),
      casebook_id uuid not null references casebooks(id) on delete cascade,
      article_id uuid not null references articles(id) on delete cascade,
      fingerprint text not null,
      sentence text not null,
      note text not null default '',
      position int not null,
      added_at timestamptz not null default now(),
      unique (casebook_id, article_id, fingerprint)
    );

    create table report_subscriptions (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references "User"(id) on delete cascade,
      venue_id uuid not null references venues(id) on delete cascade,
      frequency text not null check (frequency in ('weekly','monthly','yearly')),
      last_sent_at timestamptz,
      unique (user_id, venue_id)
    );

    create table job_events (
      id bigint generated always as identity primary key,
      article_id uuid references articles(id) on delete cascade,
      job_name text not null,
      state text not null,
      message text,
      at timestamptz not null default now()
    );
    create index job_events_article on job_events (article_id, at);
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop table job_events, report_subscriptions, casebook_items, casebooks, screenings`.execute(db);
}
