import { LABELS, formatValue, statisticName, type Comparator, type Framing, type Sourcing } from "@/lib/vocabulary";
import type { StatementKind } from "@/lib/vocabulary";
import { SourcingBadge } from "@/components/ui/sourcing-badge";

export type StatementFactsInput = {
  kind: StatementKind;
  statistic: string | null;
  statistic_label: string | null;
  comparator: Comparator | null;
  value: number | null;
  framing: Framing | null;
  sourcing: Sourcing;
  procedure_key: string | null;
  page: number | null;
};

/**
 * What the miner read from one sentence, in words: its kind, the rule ("Cronbach's α ≥ .70"; an
 * `other` statistic by the name the sentence used), the framing, and how it is sourced. A disputed
 * cut-off (the sentence argues against it) gets its own badge in words and a dashed outline, and no
 * sourcing badge: it does not assert the practice, so it is never counted as doing so.
 */
export function StatementFacts({ s, procedureLabel }: { s: StatementFactsInput; procedureLabel?: string }) {
  const disputed = s.kind === "threshold" && s.framing === "disputed";
  const stat = s.statistic ? statisticName(s.statistic, s.statistic_label) : null;
  return (
    <>
      {disputed ? (
        <span
          className="inline-flex items-center rounded-full border border-dashed border-ink-2 px-2 py-0.5 text-xs font-medium text-ink"
          data-testid="disputed-badge"
          title="The sentence names this cut-off to argue against it; it does not count as asserting the practice."
        >
          Disputed: argued against
        </span>
      ) : (
        // Sourcing is about cut-off claims; an obtained value needs no source.
        s.kind === "threshold" && <SourcingBadge sourcing={s.sourcing} />
      )}
      <span>{LABELS.statementKind[s.kind]}</span>
      {stat && (
        <span>
          {stat}
          {s.statistic === "other" && s.statistic_label && (
            <span className="sr-only"> (a statistic outside the list)</span>
          )}
        </span>
      )}
      {s.comparator && s.value !== null && (
        <span className="tabular-nums">
          {LABELS.comparator[s.comparator]} {formatValue(s.value)}
        </span>
      )}
      {!s.comparator && s.value !== null && <span className="tabular-nums">{formatValue(s.value)}</span>}
      {s.framing && !disputed && <span>{LABELS.framing[s.framing]}</span>}
      {s.procedure_key && <span>{procedureLabel ?? s.procedure_key}</span>}
      <span className="tabular-nums">{s.page === null ? "page unknown" : `page ${s.page}`}</span>
    </>
  );
}
