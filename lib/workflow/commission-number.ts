/** A commission's number within its workshop: the year it was opened and a running count, e.g. "2027-014". */
export function formatCommissionNumber(year: number, sequence: number): string {
  return `${year}-${String(sequence).padStart(3, "0")}`;
}

export function parseCommissionNumber(text: string): { year: number; sequence: number } | null {
  const m = /^(\d{4})-(\d{3,})$/.exec(text.trim());
  return m ? { year: Number(m[1]), sequence: Number(m[2]) } : null;
}
