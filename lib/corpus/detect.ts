/**
 * The file type is decided by content, never by the name: a PDF by its header, JATS by being XML
 * (the miner then checks that it really is JATS), plain text by being valid UTF-8 without control
 * bytes. Everything else is refused with a message that says what the file looks like.
 */
import { fileTypeFromBuffer } from "file-type";
import type { SourceKind } from "@/lib/vocabulary";

export type Detected = { kind: SourceKind; mediaType: string } | { kind: null; reason: string };

const MEDIA: Record<SourceKind, string> = { pdf: "application/pdf", jats: "application/jats+xml", text: "text/plain" };

// PDF readers accept the "%PDF-" header anywhere in the first 1024 bytes (PDF 1.7, ISO 32000-1,
// Annex H.3 implementation note 13), so junk before the header must not make a real PDF a reject.
function hasPdfHeader(data: Uint8Array): boolean {
  const head = Buffer.from(data.subarray(0, 1024)).toString("latin1");
  return head.includes("%PDF-");
}

function decodeUtf8(data: Uint8Array): string | null {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(data.subarray(0, 64 * 1024));
  } catch (err) {
    // A multi-byte character cut by our 64 KiB window is not a reason to refuse the file.
    if (data.length > 64 * 1024) {
      try {
        return new TextDecoder("utf-8", { fatal: true }).decode(data.subarray(0, 64 * 1024 - 4));
      } catch {
        return null;
      }
    }
    void err;
    return null;
  }
}

export async function detectKind(data: Uint8Array): Promise<Detected> {
  if (data.length === 0) return { kind: null, reason: "The file is empty (0 bytes)." };
  if (hasPdfHeader(data)) return { kind: "pdf", mediaType: MEDIA.pdf };
  const ft = await fileTypeFromBuffer(data);
  if (ft && ft.ext !== "xml") {
    return { kind: null, reason: `The file's content is ${ft.mime} (.${ft.ext}), not a PDF, JATS XML or plain text.` };
  }
  const text = decodeUtf8(data);
  if (text === null)
    return { kind: null, reason: "The file is neither a PDF nor UTF-8 text (binary content of an unknown type)." };
  const start = text.replace(/^\uFEFF/, "").trimStart();
  if (ft?.ext === "xml" || start.startsWith("<?xml") || /^<(!DOCTYPE\s+)?[A-Za-z]/.test(start))
    return { kind: "jats", mediaType: MEDIA.jats };
  // Control bytes other than tab, newline, carriage return and form feed mean this is not text.
  if (/[\u0000-\u0008\u000B\u000E-\u001F]/.test(text))
    return { kind: null, reason: "The file contains binary control bytes, so it is not plain text." };
  return { kind: "text", mediaType: MEDIA.text };
}
