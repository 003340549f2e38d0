/** A DOI as stored: without a resolver prefix; null when the text is not a DOI. */
export function normaliseDoi(doi: string | undefined | null): string | null {
  if (!doi) return null;
  const d = doi
    .trim()
    .replace(/^(https?:\/\/(dx\.)?doi\.org\/|doi:\s*)/i, "")
    .trim();
  return /^10\.\S+\/\S+$/.test(d) ? d : null;
}
