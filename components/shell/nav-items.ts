import type { Permission } from "@/lib/auth/permissions";

/** The navigation; each entry shows only to roles with its permission (the page checks again). */
export const NAV_ITEMS: { href: string; label: string; permission: Permission; group: "work" | "admin" }[] = [
  { href: "/home", label: "Home", permission: "corpus:read", group: "work" },
  { href: "/articles", label: "Articles", permission: "corpus:read", group: "work" },
  { href: "/dashboards", label: "Dashboards", permission: "corpus:read", group: "work" },
  { href: "/works", label: "Cited works", permission: "corpus:read", group: "work" },
  { href: "/upload", label: "Upload", permission: "corpus:upload", group: "work" },
  { href: "/practices", label: "Practices", permission: "corpus:read", group: "work" },
  { href: "/admin/people", label: "People", permission: "admin:users", group: "admin" },
  { href: "/admin/venues", label: "Venues", permission: "admin:venues", group: "admin" },
  { href: "/admin/mail", label: "Captured mail", permission: "admin:mail", group: "admin" },
];
