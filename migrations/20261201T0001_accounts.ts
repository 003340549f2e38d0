import { sql, type Kysely } from "kysely";

// Sign-in tables. "User", "Account", "Session" and "VerificationToken" keep the names and camelCase
// columns that @auth/kysely-adapter queries; everything Echoline adds to them is snake_case.
export async function up(db: Kysely<unknown>): Promise<void> {
  await sql`
    create table "User" (
      id uuid primary key default gen_random_uuid(),
      name text,
      email text not null,
      "emailVerified" timestamptz,
      image text,
      role text not null default 'reader' check (role in ('admin','curator','editor','instructor','reader')),
      password_hash text,
      deactivated_at timestamptz,
      is_demo boolean not null default false,
      created_at timestamptz not null default now()
    );
    create unique index user_email_lower on "User" (lower(email));

    create table "Account" (
      id uuid primary key default gen_random_uuid(),
      "userId" uuid not null references "User"(id) on delete cascade,
      type text not null,
      provider text not null,
      "providerAccountId" text not null,
      refresh_token text, access_token text, expires_at bigint, token_type text,
      scope text, id_token text, session_state text,
      unique (provider, "providerAccountId")
    );

    create table "Session" (
      id uuid primary key default gen_random_uuid(),
      "userId" uuid not null references "User"(id) on delete cascade,
      "sessionToken" text not null unique,
      expires timestamptz not null
    );

    create table "VerificationToken" (
      identifier text not null,
      token text not null,
      expires timestamptz not null,
      primary key (identifier, token)
    );

    -- Every magic link ever issued, so that a reused link can be told apart from a wrong one.
    create table used_sign_in_links (
      token_hash text primary key,
      identifier text not null,
      used_at timestamptz not null default now()
    );

    create table invitations (
      id uuid primary key default gen_random_uuid(),
      email text not null,
      role text not null check (role in ('admin','curator','editor','instructor','reader')),
      token_hash text not null unique,
      invited_by uuid references "User"(id) on delete set null,
      user_id uuid not null references "User"(id) on delete cascade,
      created_at timestamptz not null default now(),
      expires_at timestamptz not null,
      accepted_at timestamptz
    );

    create table sign_in_attempts (
      id bigint generated always as identity primary key,
      key text not null,
      ip text,
      succeeded boolean not null,
      at timestamptz not null default now()
    );
    create index sign_in_attempts_key_at on sign_in_attempts (key, at);
    create index sign_in_attempts_ip_at on sign_in_attempts (ip, at);

    create table audit_log (
      id bigint generated always as identity primary key,
      actor_id uuid references "User"(id) on delete set null,
      action text not null,
      target text,
      detail jsonb not null default '{}',
      at timestamptz not null default now()
    );
  `.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await sql`drop table audit_log, sign_in_attempts, invitations, used_sign_in_links, "VerificationToken", "Session", "Account", "User"`.execute(
    db,
  );
}
