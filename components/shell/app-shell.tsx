import Link from "next/link";
import { NAV_ITEMS } from "./nav-items";
import { can, type Actor } from "@/lib/auth/permissions";
import { ThemeToggle } from "./theme-toggle";
import { NavLink } from "./nav-link";

const ROLE_LABEL = {
  admin: "Admin",
  curator: "Curator",
  editor: "Editor",
  instructor: "Instructor",
  reader: "Reader",
} as const;

export function AppShell({ actor, children }: { actor: Actor; children: React.ReactNode }) {
  const items = NAV_ITEMS.filter((i) => can(actor, i.permission));
  return (
    <div className="flex-1 flex flex-col">
      <header className="border-b border-rule bg-paper">
        <div className="mx-auto max-w-6xl px-4 py-3 flex flex-wrap items-center gap-x-6 gap-y-2">
          <Link href="/home" className="font-serif text-xl font-semibold tracking-tight">
            Echoline
          </Link>
          <nav aria-label="Main" className="flex-1">
            <ul className="flex flex-wrap gap-1 text-sm" data-testid="main-nav">
              {items
                .filter((i) => i.group === "work")
                .map((i) => (
                  <li key={i.href}>
                    <NavLink href={i.href}>{i.label}</NavLink>
                  </li>
                ))}
              {items.some((i) => i.group === "admin") && <li aria-hidden className="mx-2 border-l border-rule" />}
              {items
                .filter((i) => i.group === "admin")
                .map((i) => (
                  <li key={i.href}>
                    <NavLink href={i.href}>{i.label}</NavLink>
                  </li>
                ))}
            </ul>
          </nav>
          <div className="flex items-center gap-3 text-sm">
            <span className="text-ink-2" data-testid="who">
              {actor.name ?? actor.email} · <span className="font-medium text-ink">{ROLE_LABEL[actor.role]}</span>
            </span>
            <ThemeToggle />
            <form action="/api/auth/sign-out" method="post">
              <button className="rounded border border-rule px-2 py-1 hover:bg-paper-2" type="submit">
                Sign out
              </button>
            </form>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">
        {children}
      </main>
    </div>
  );
}
