/**
 * Who may do what. One role → permission map, checked on the server by every page, route handler
 * and job that acts for a person (lib/server/request.ts and lib/server/session.ts call `can`).
 */
import type { Role } from "@/lib/vocabulary";

export type Permission =
  | "corpus:read" // browse and search articles, statements, works, dashboards
  | "corpus:upload" // upload articles and metadata
  | "corpus:curate" // correct metadata, review statements, merge works, source checks, re-mine
  | "practices:manage" // define practices and the procedure list
  | "screening:run" // private screening of a manuscript
  | "benchmark:view" // venue benchmarks
  | "casebook:manage" // build and share casebooks
  | "admin:users" // invite, change roles, deactivate
  | "admin:venues" // define venues and methods venues
  | "admin:mail"; // read the local mail fake's captured messages

const ALL: Permission[] = [
  "corpus:read",
  "corpus:upload",
  "corpus:curate",
  "practices:manage",
  "screening:run",
  "benchmark:view",
  "casebook:manage",
  "admin:users",
  "admin:venues",
  "admin:mail",
];

export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  admin: ALL,
  curator: ["corpus:read", "corpus:upload", "corpus:curate", "practices:manage", "benchmark:view"],
  editor: ["corpus:read", "screening:run", "benchmark:view"],
  instructor: ["corpus:read", "casebook:manage"],
  reader: ["corpus:read"],
};

export interface Actor {
  id: string;
  role: Role;
  email: string;
  name: string | null;
  venueIds: string[];
}

export function can(actor: Actor | null | undefined, permission: Permission): boolean {
  return !!actor && ROLE_PERMISSIONS[actor.role].includes(permission);
}

/** Editors benchmark and screen only for the venues they are linked to; admins for any. */
export function canActForVenue(actor: Actor | null | undefined, venueId: string): boolean {
  if (!actor) return false;
  if (actor.role === "admin") return true;
  return actor.role === "editor" && actor.venueIds.includes(venueId);
}
