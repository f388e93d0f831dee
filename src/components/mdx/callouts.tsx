import type { ReactNode } from "react";

interface CalloutProps {
  title?: string;
  children?: ReactNode;
}

/** The line every safety caution ends with. */
export const DEFERRAL_LINE =
  "Follow your local codes, the manufacturers' data sheets and licensed practice; this lesson does not replace them.";

function InfoIcon() {
  return (
    <svg viewBox="0 0 20 20" className="size-5 shrink-0" aria-hidden="true" focusable="false">
      <circle cx="10" cy="10" r="8.25" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <path d="M10 9v5" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
      <circle cx="10" cy="6.2" r="1.1" fill="currentColor" />
    </svg>
  );
}

function WarningIcon() {
  return (
    <svg viewBox="0 0 20 20" className="size-5 shrink-0" aria-hidden="true" focusable="false">
      <path d="M10 2.2 18.4 17H1.6Z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
      <path d="M10 7.5v4.6" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
      <circle cx="10" cy="14.4" r="1.05" fill="currentColor" />
    </svg>
  );
}

function AnvilIcon() {
  return (
    <svg viewBox="0 0 20 20" className="size-5 shrink-0" aria-hidden="true" focusable="false">
      <path d="M2 6h11.5c0 2.2 1.8 3 4.5 3v1.2c-2.6.4-4 1.4-4.6 3H7.2C6.6 11.6 4.6 10 2 9.6Z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      <path d="M6 13.2 5 17h10l-1-3.8" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
    </svg>
  );
}

/** An aside. */
export function Note({ title, children }: CalloutProps) {
  return (
    <aside className="callout callout-note" aria-label={title ?? "Note"}>
      <div className="callout-title">
        <InfoIcon />
        <span>{title ?? "Note"}</span>
      </div>
      <div className="callout-body">{children}</div>
    </aside>
  );
}

/** A safety caution: hazard styling, an icon, and the standard deferral to codes, data sheets and licensed practice. */
export function Caution({ title, children }: CalloutProps) {
  return (
    <aside className="callout callout-caution" aria-label={`Safety caution: ${title ?? "take care"}`}>
      <div className="callout-title">
        <WarningIcon />
        <span>
          <span className="callout-kicker">Safety</span> {title ?? "Take care"}
        </span>
      </div>
      <div className="callout-body">{children}</div>
      <p className="callout-deferral">{DEFERRAL_LINE}</p>
    </aside>
  );
}

/** A trade rule of thumb, labelled as such. */
export function CommonPractice({ title, children }: CalloutProps) {
  return (
    <aside className="callout callout-practice" aria-label={`Common practice${title ? `: ${title}` : ""}`}>
      <div className="callout-title">
        <AnvilIcon />
        <span>{title ?? "Common practice"}</span>
        <span className="callout-badge">common practice, no published source</span>
      </div>
      <div className="callout-body">{children}</div>
    </aside>
  );
}
