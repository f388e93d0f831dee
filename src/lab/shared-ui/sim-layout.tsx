import type { ReactNode } from "react";

interface SimLayoutProps {
  /** Accessible name of the whole simulation region. */
  label: string;
  /** The drawing area: canvas, legend, live summary. */
  stage: ReactNode;
  /** The form controls. */
  controls: ReactNode;
  /** Full-width content under both (charts, "How this is computed"). */
  footer?: ReactNode;
}

/**
 * Two columns when the container is wide (a lab page), one column with the controls under the canvas
 * when it is narrow (a phone, or a simulation embedded in a lesson's prose column). Uses container
 * queries, so it responds to the space it is given rather than to the window.
 */
export function SimLayout({ label, stage, controls, footer }: SimLayoutProps) {
  return (
    <section aria-label={label} className="@container">
      <div className="grid gap-5 @4xl:grid-cols-[minmax(0,1fr)_20rem] @4xl:items-start @5xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-3">{stage}</div>
        <form
          className="min-w-0 space-y-4 rounded-lg border border-bone-300 bg-white p-4 shadow-card"
          aria-label="Simulation controls"
          onSubmit={(e) => e.preventDefault()}
        >
          {controls}
        </form>
      </div>
      {footer ? <div className="mt-6 space-y-4">{footer}</div> : null}
    </section>
  );
}
