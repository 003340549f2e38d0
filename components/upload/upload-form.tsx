"use client";
import Link from "next/link";
import { useCallback, useId, useRef, useState } from "react";
import { fetchJson } from "@/lib/http/fetch-json";
import { LABELS, plural } from "@/lib/vocabulary";
import { useUploadBatch } from "./use-upload-batch";

type Row = {
  key: string;
  name: string;
  size: number;
  phase: "waiting" | "sending" | "sent" | "refused";
  articleId?: string;
  duplicate?: boolean;
  error?: string;
};

const MAX_MB = 50;
const PARALLEL = 2;

export function UploadForm() {
  const [rows, setRows] = useState<Row[]>([]);
  const [meta, setMeta] = useState<File | null>(null);
  const [batchId, setBatchId] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const [metaNote, setMetaNote] = useState<string | null>(null);
  const [dragging, setDragging] = useState(false);
  const filesRef = useRef<Map<string, File>>(new Map());
  const inputId = useId();
  const metaId = useId();
  const errId = useId();

  const addFiles = useCallback((list: FileList | File[]) => {
    const next: Row[] = [];
    for (const f of Array.from(list)) {
      const key = `${f.name}:${f.size}:${f.lastModified}`;
      if (filesRef.current.has(key)) continue;
      filesRef.current.set(key, f);
      next.push({ key, name: f.name, size: f.size, phase: "waiting" });
    }
    setRows((r) => [...r, ...next]);
    setFormError(null);
  }, []);

  const articleIds = rows.map((r) => r.articleId).filter(Boolean) as string[];
  const pending = rows.some((r) => r.phase === "waiting" || r.phase === "sending");
  const status = useUploadBatch(batchId, articleIds, pending);
  const byId = new Map((status.data?.files ?? []).map((f) => [f.id, f]));

  const update = (key: string, patch: Partial<Row>) =>
    setRows((rs) => rs.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  async function start(e: React.FormEvent) {
    e.preventDefault();
    const waiting = rows.filter((r) => r.phase === "waiting");
    if (!waiting.length) {
      setFormError("Choose or drop at least one PDF, JATS XML or plain-text file first.");
      return;
    }
    setBusy(true);
    setFormError(null);
    try {
      const metadata = meta ? { filename: meta.name, text: await meta.text() } : null;
      const b = await fetchJson<{
        batchId: string;
        metadata: { format: string; entries: number; warnings: string[] } | null;
      }>("/api/uploads", { method: "POST", json: { metadata } });
      setBatchId(b.batchId);
      if (b.metadata)
        setMetaNote(
          `${plural(b.metadata.entries, "entry", "entries")} read from the ${b.metadata.format.toUpperCase()} file.${b.metadata.warnings.length ? " " + b.metadata.warnings.join(" ") : ""}`,
        );
      const queue = [...waiting];
      const worker = async () => {
        for (let r = queue.shift(); r; r = queue.shift()) {
          const file = filesRef.current.get(r.key)!;
          if (file.size > MAX_MB * 1024 * 1024) {
            update(r.key, { phase: "refused", error: `Larger than the ${MAX_MB} MB limit per file.` });
            continue;
          }
          update(r.key, { phase: "sending" });
          try {
            const out = await fetchJson<{ articleId: string; duplicate: boolean }>(
              `/api/uploads/${b.batchId}/files?name=${encodeURIComponent(file.name)}`,
              { method: "POST", headers: { "content-type": "application/octet-stream" }, body: file },
            );
            update(r.key, { phase: "sent", articleId: out.articleId, duplicate: out.duplicate });
          } catch (err) {
            update(r.key, { phase: "refused", error: (err as Error).message });
          }
        }
      };
      await Promise.all(Array.from({ length: PARALLEL }, worker));
    } catch (err) {
      setFormError((err as Error).message);
    } finally {
      setBusy(false);
    }
  }

  const stateOf = (r: Row): { label: string; tone: "wait" | "ok" | "bad"; reason?: string; mined?: boolean } => {
    if (r.phase === "refused") return { label: "Refused", tone: "bad", reason: r.error };
    if (r.phase === "waiting") return { label: "Ready to upload", tone: "wait" };
    if (r.phase === "sending") return { label: "Uploading", tone: "wait" };
    const f = r.articleId ? byId.get(r.articleId) : undefined;
    if (!f) return { label: "Uploaded", tone: "wait" };
    if (f.status === "failed")
      return { label: "Failed", tone: "bad", reason: f.failure_message ?? "No reason recorded." };
    return {
      label: LABELS.articleStatus[f.status] + (r.duplicate ? " (duplicate: already in the corpus)" : ""),
      tone: f.status === "done" ? "ok" : "wait",
      mined: f.status === "done",
    };
  };
  const states = rows.map(stateOf);
  const done = states.filter((s) => s.mined).length;
  const failed = states.filter((s) => s.tone === "bad").length;
  const finished = done + failed;

  return (
    <form onSubmit={start} className="grid gap-5" aria-describedby={formError ? errId : undefined}>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={(e) => {
          e.preventDefault();
          setDragging(false);
          addFiles(e.dataTransfer.files);
        }}
        className={`rounded-lg border-2 border-dashed p-8 text-center ${dragging ? "border-accent bg-paper-2" : "border-rule"}`}
      >
        <p className="text-lg">Drop PDF, JATS XML or plain-text files here</p>
        <p className="mt-1 text-sm text-ink-2">or</p>
        <label
          htmlFor={inputId}
          className="mt-2 inline-block cursor-pointer rounded border border-rule px-3 py-1.5 hover:bg-paper-2"
        >
          Choose files
        </label>
        <input
          id={inputId}
          type="file"
          multiple
          accept=".pdf,.xml,.nxml,.txt,application/pdf,application/xml,text/xml,text/plain"
          className="sr-only"
          onChange={(e) => {
            if (e.target.files) addFiles(e.target.files);
            e.target.value = "";
          }}
          aria-label="Article files"
        />
        <p className="mt-3 text-xs text-ink-2">
          Up to {MAX_MB} MB per file. The type is read from the file itself, not its name. Load only articles whose
          licence allows text mining.
        </p>
      </div>

      <div className="grid gap-1">
        <label htmlFor={metaId} className="font-medium">
          Metadata file (optional)
        </label>
        <input
          id={metaId}
          type="file"
          accept=".bib,.bibtex,.ris,.csv,text/csv"
          onChange={(e) => setMeta(e.target.files?.[0] ?? null)}
          aria-describedby={`${metaId}-hint`}
        />
        <p id={`${metaId}-hint`} className="text-sm text-ink-2">
          BibTeX, RIS or CSV (columns doi, title, authors, year, venue, licence, file). Entries are matched to the files
          by DOI or file name.
        </p>
        {metaNote && (
          <p className="text-sm" role="status">
            {metaNote}
          </p>
        )}
      </div>

      <div aria-live="polite">
        {formError && (
          <p id={errId} className="rounded border border-accent px-3 py-2 text-accent" role="alert">
            {formError}
          </p>
        )}
      </div>

      <div className="flex items-center gap-3">
        <button type="submit" disabled={busy} className="rounded bg-ink px-4 py-2 text-paper disabled:opacity-60">
          {busy ? "Uploading…" : uploadLabel(rows.filter((r) => r.phase === "waiting").length)}
        </button>
        {rows.length > 0 && (
          <div className="flex flex-1 items-center gap-3">
            <progress className="h-2 flex-1" max={rows.length} value={finished} aria-label="Batch progress" />
            <span className="text-sm tabular-nums" aria-live="polite" data-testid="batch-counts">
              {finished} of {rows.length} finished · {done} mined · {failed} failed
            </span>
          </div>
        )}
      </div>

      {rows.length > 0 && (
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-rule text-left text-ink-2">
              <th className="py-1 pr-3 font-medium">File</th>
              <th className="py-1 pr-3 font-medium">Size</th>
              <th className="py-1 font-medium">Status</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => {
              const s = states[i];
              return (
                <tr key={r.key} className="border-b border-rule align-top" data-testid="upload-row">
                  <td className="py-1.5 pr-3">
                    {r.articleId && s.mined ? (
                      <Link className="underline" href={`/articles/${r.articleId}`}>
                        {r.name}
                      </Link>
                    ) : (
                      r.name
                    )}
                  </td>
                  <td className="py-1.5 pr-3 tabular-nums">{(r.size / 1024).toFixed(0)} KB</td>
                  <td className="py-1.5" aria-live="polite">
                    <span
                      className={
                        s.tone === "bad" ? "font-medium text-accent" : s.tone === "ok" ? "font-medium" : "text-ink-2"
                      }
                      data-testid="upload-status"
                    >
                      {s.label}
                    </span>
                    {s.reason && <span className="block text-ink-2">{s.reason}</span>}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
    </form>
  );
}

const uploadLabel = (n: number) => (n === 0 ? "Upload files" : `Upload ${plural(n, "file")}`);
