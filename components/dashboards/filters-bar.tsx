"use client";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { ASSERTING_FRAMINGS, LABELS } from "@/lib/vocabulary";
import { usePractices } from "@/components/practices/use-practices";

export type VenueOption = { id: string; name: string };

/** Filters live in the URL so every view is a shareable link. */
export function FiltersBar({ venues }: { venues: VenueOption[] }) {
  const router = useRouter();
  const pathname = usePathname();
  const sp = useSearchParams();
  const practices = usePractices();
  const set = (key: string, value: string | null) => {
    const next = new URLSearchParams(sp.toString());
    if (value) next.set(key, value);
    else next.delete(key);
    if (key === "statistic") next.delete("practice");
    router.replace(`${pathname}?${next.toString()}`, { scroll: false });
  };
  const chosenVenues = (sp.get("venues") ?? "").split(",").filter(Boolean);
  const statistic = sp.get("statistic") ?? "";
  const list = (practices.data?.practices ?? []).filter((p) => !statistic || p.statistic === statistic);
  return (
    <form
      className="flex flex-wrap items-end gap-3 rounded border border-rule bg-paper-2 p-3 text-sm"
      aria-label="Dashboard filters"
      onSubmit={(e) => e.preventDefault()}
    >
      <label className="flex flex-col">
        Statistic
        <select
          name="statistic"
          value={statistic}
          onChange={(e) => set("statistic", e.target.value || null)}
          className="rounded border border-rule bg-paper px-2 py-1"
        >
          <option value="">Any</option>
          {(practices.data?.statistics ?? [])
            .filter((s) => (practices.data?.practices ?? []).some((p) => p.statistic === s))
            .map((s) => (
              <option key={s} value={s}>
                {LABELS.statistic[s]}
              </option>
            ))}
        </select>
      </label>
      <label className="flex flex-col">
        Practice
        <select
          name="practice"
          value={sp.get("practice") ?? ""}
          onChange={(e) => set("practice", e.target.value || null)}
          className="max-w-xs rounded border border-rule bg-paper px-2 py-1"
        >
          <option value="">
            Most asserted
            {statistic ? ` for ${LABELS.statistic[statistic as keyof typeof LABELS.statistic] ?? statistic}` : ""}
          </option>
          {list.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        Framing
        <select
          name="framing"
          value={sp.get("framing") ?? ""}
          onChange={(e) => set("framing", e.target.value || null)}
          className="rounded border border-rule bg-paper px-2 py-1"
        >
          <option value="">Any</option>
          {ASSERTING_FRAMINGS.map((f) => (
            <option key={f} value={f}>
              {LABELS.framing[f]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col">
        From year
        <input
          name="from"
          type="number"
          min={1800}
          max={2100}
          defaultValue={sp.get("from") ?? ""}
          onBlur={(e) => set("from", e.target.value || null)}
          className="w-24 rounded border border-rule bg-paper px-2 py-1"
        />
      </label>
      <label className="flex flex-col">
        To year
        <input
          name="to"
          type="number"
          min={1800}
          max={2100}
          defaultValue={sp.get("to") ?? ""}
          onBlur={(e) => set("to", e.target.value || null)}
          className="w-24 rounded border border-rule bg-paper px-2 py-1"
        />
      </label>
      <fieldset className="flex flex-col">
        <legend>Venues</legend>
        <select
          name="venues"
          multiple
          size={Math.min(4, Math.max(2, venues.length))}
          value={chosenVenues}
          onChange={(e) => set("venues", [...e.target.selectedOptions].map((o) => o.value).join(",") || null)}
          className="rounded border border-rule bg-paper px-2 py-1"
          aria-label="Venues (none chosen: all)"
        >
          {venues.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </select>
      </fieldset>
    </form>
  );
}
