// The PDF standard fonts encode WinAnsi only: map common typographic characters to ones they have
// and drop anything else, so a workshop name or note never breaks a printout.
const REPLACEMENTS: Record<string, string> = { "−": "-", "–": "-", "—": "-", "’": "'", "‘": "'", "“": '"', "”": '"', "×": "x", "≈": "~", "…": "...", "·": "-" };

export function pdfSafe(text: string): string {
  return [...text]
    .map((ch) => REPLACEMENTS[ch] ?? ch)
    .join("")
    .replace(/[^\x20-\x7e\xa0-\xff]/g, "?");
}
