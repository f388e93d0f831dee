/** Formatting shared by the teaching screens. */
const DAY_MS = 86_400_000;

const dateFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric" });
const dateTimeFormat = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });
const shortDate = new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short" });

export const formatDay = (iso: string | null | undefined) => (iso ? dateFormat.format(new Date(iso)) : "—");
export const formatDateTime = (iso: string | null | undefined) => (iso ? dateTimeFormat.format(new Date(iso)) : "—");
export const formatShortDate = (iso: string) => shortDate.format(new Date(iso));

/** 0.456 -> "46 %"; null -> "—". */
export function percent(share: number | null | undefined, digits = 0): string {
  if (share === null || share === undefined || Number.isNaN(share)) return "—";
  return `${(share * 100).toFixed(digits)} %`;
}

/** "in 3 days", "tomorrow", "today", "2 days ago". */
export function relativeDue(iso: string, now = Date.now()): string {
  const days = Math.round((new Date(iso).getTime() - now) / DAY_MS);
  if (days === 0) return new Date(iso).getTime() >= now ? "today" : "earlier today";
  if (days === 1) return "tomorrow";
  if (days === -1) return "yesterday";
  return days > 0 ? `in ${days} days` : `${-days} days ago`;
}

/** A value for <input type="datetime-local"> in the browser's time zone. */
export function toLocalInput(iso: string): string {
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** <input type="datetime-local"> value (local time) -> ISO 8601 in UTC, or null when empty/invalid. */
export function fromLocalInput(value: string): string | null {
  if (!value) return null;
  const d = new Date(value);
  return Number.isNaN(d.getTime()) ? null : d.toISOString();
}

export function plural(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
