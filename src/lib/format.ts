/** Display helpers shared by the history, compare and review screens. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function formatDate(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleDateString(undefined, { dateStyle: 'medium' });
}

/** A ratio as the check board writes it: two decimals, or "not computed". */
export function formatRatio(ratio: number | null): string {
  return ratio === null || !Number.isFinite(ratio) ? 'not computed' : ratio.toFixed(2);
}
