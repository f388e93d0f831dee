import type { ReactNode } from "react";

/** The collapsible "How this is computed" panel: model, assumptions and sources, in plain words. */
export function HowComputed({ children, title = "How this is computed" }: { children: ReactNode; title?: string }) {
  return (
    <details className="group rounded-md border border-bone-300 bg-white">
      <summary className="flex min-h-11 cursor-pointer list-none items-center justify-between gap-3 px-4 font-semibold text-soot-900 marker:hidden">
        <span>{title}</span>
        <span aria-hidden="true" className="font-mono text-ember-700 transition-transform group-open:rotate-45">
          +
        </span>
      </summary>
      <div className="prose prose-sm prose-stone max-w-none border-t border-bone-300 px-4 pb-4 pt-2 prose-h3:text-base prose-h3:mt-4">
        {children}
      </div>
    </details>
  );
}
