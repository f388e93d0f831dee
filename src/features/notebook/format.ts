/** Number and date formatting for the notebook screens (en-GB, like the rest of the product). */

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "2026-03-14" -> "14 Mar 2026" (a calendar date, so no time zone shift). */
export function formatDay(isoDay: string): string {
  const d = new Date(`${isoDay}T00:00:00Z`);
  return Number.isNaN(d.getTime()) ? isoDay : dateFormat.format(d);
}

export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  return new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" }).format(d);
}

/** Hollomon–Jaffe parameter, rounded to a whole number with a thousands separator. */
export function formatParameter(p: number): string {
  return Math.round(p).toLocaleString("en-GB");
}

/** Hours as a person would say them: "18 min", "2.5 h", "3.2 days". */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours)) return "—";
  if (hours < 1 / 60) return `${Math.max(1, Math.round(hours * 3600))} s`;
  if (hours < 1) return `${Math.round(hours * 60)} min`;
  if (hours < 48) return `${Number(hours.toPrecision(3))} h`;
  if (hours < 24 * 365) return `${Number((hours / 24).toPrecision(3))} days`;
  return `${Number((hours / (24 * 365)).toPrecision(2))} years`;
}

export function formatHrc(hrc: number): string {
  return `${hrc.toFixed(1)} HRC`;
}

export function formatPercent(fraction: number): string {
  return `${(fraction * 100).toFixed(fraction < 0.1 ? 1 : 0)} %`;
}

export function formatTempC(c: number): string {
  return `${Number(c.toFixed(1))} °C`;
}

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** Today in the user's time zone, as YYYY-MM-DD. */
export function todayIso(): string {
  const now = new Date();
  const local = new Date(now.getTime() - now.getTimezoneOffset() * 60_000);
  return local.toISOString().slice(0, 10);
}
