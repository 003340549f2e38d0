import type { Sourcing } from "@/lib/vocabulary";
import { SOURCING } from "./sourcing";

export function SourcingBadge({ sourcing }: { sourcing: Sourcing }) {
  const s = SOURCING[sourcing];
  return (
    <span
      className="inline-flex items-center gap-1.5 rounded-full border px-2 py-0.5 text-xs font-medium"
      style={{ borderColor: s.color, color: s.color }}
    >
      <svg width="10" height="10" aria-hidden="true">
        <rect width="10" height="10" rx="2" fill={s.pattern === "solid" ? s.color : "none"} stroke={s.color} />
        {s.pattern === "lines" && <path d="M0 10 L10 0 M-2 4 L4 -2 M6 12 L12 6" stroke={s.color} />}
        {s.pattern === "dots" && <circle cx="5" cy="5" r="2" fill={s.color} />}
        {s.pattern === "cross" && <path d="M2 2 L8 8 M8 2 L2 8" stroke={s.color} />}
      </svg>
      {s.label}
    </span>
  );
}
