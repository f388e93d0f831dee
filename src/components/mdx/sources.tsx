import type { ReactNode } from "react";

/** The sources of a lesson: author, title, year, table or standard number. */
export function Sources({ children }: { children?: ReactNode }) {
  return (
    <section className="lesson-sources" aria-labelledby="lesson-sources-heading">
      <h2 id="lesson-sources-heading">Sources</h2>
      {children}
    </section>
  );
}
