"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function NavLink({ href, children }: { href: string; children: React.ReactNode }) {
  const path = usePathname();
  const active = path === href || path.startsWith(href + "/");
  return (
    <Link
      href={href}
      aria-current={active ? "page" : undefined}
      className={`block rounded px-2 py-1 ${active ? "bg-paper-2 font-semibold text-ink" : "text-ink-2 hover:text-ink hover:bg-paper-2"}`}
    >
      {children}
    </Link>
  );
}
