import type { ColumnType, Generated } from "kysely";

import type { Role } from "@/lib/vocabulary";

export type { Role };
type Timestamp = ColumnType<Date, Date | string, Date | string>;

// Names and camelCase columns as @auth/kysely-adapter expects them.
export interface UserTable {
  id: Generated<string>;
  name: string | null;
  email: string;
  emailVerified: Timestamp | null;
  image: string | null;
  role: Generated<Role>;
  password_hash: string | null;
  deactivated_at: Timestamp | null;
  is_demo: Generated<boolean>;
  created_at: Generated<Timestamp>;
}
export interface AccountTable {
  id: Generated<string>;
  userId: string;
  type: string;
  provider: string;
  providerAccountId: string;
  refresh_token: string | null;
  access_token: string | null;
  expires_at: number | null;
  token_type: string | null;
  scope: string | null;
  id_token: string | null;
  session_state: string | null;
}
export interface SessionTable {
  id: Generated<string>;
  userId: string;
  sessionToken: string;
  expires: Timestamp;
}
export interface VerificationTokenTable {
  identifier: string;
  token: string;
  expires: Timestamp;
}
export interface UsedSignInLinkTable {
  token_hash: string;
  identifier: string;
  used_at: Generated<Timestamp>;
}
export interface InvitationTable {
  id: Generated<string>;
  email: string;
  role: Role;
  token_hash: string;
  invited_by: string | null;
  user_id: string;
  created_at: Generated<Timestamp>;
  expires_at: Timestamp;
  accepted_at: Timestamp | null;
}
export interface SignInAttemptTable {
  id: Generated<string>;
  key: string;
  ip: string | null;
  succeeded: boolean;
  at: Generated<Timestamp>;
}
export interface AuditLogTable {
  id: Generated<string>;
  actor_id: string | null;
  action: string;
  target: string | null;
  detail: ColumnType<unknown, string | undefined, string>;
  at: Generated<Timestamp>;
}
