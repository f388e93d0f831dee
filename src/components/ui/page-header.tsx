import type { ReactNode } from "react";

interface PageHeaderProps {
  eyebrow?: string;
  title: ReactNode;
  lede?: ReactNode;
  children?: ReactNode;
}

/** The dark "forge" band at the top of every inner page. */
export function PageHeader({ eyebrow, title, lede, children }: PageHeaderProps) {
  return (
    <div className="graticule bg-soot-800 text-bone-50">
      <div className="mx-auto max-w-page px-gutter pb-9 pt-10 md:pb-12 md:pt-14">
        {eyebrow ? <p className="eyebrow text-ember-300">{eyebrow}</p> : null}
        <h1 className="mt-2 text-3xl font-semibold tracking-tight md:text-5xl">{title}</h1>
        {lede ? <p className="mt-3 max-w-prose text-base leading-relaxed text-ash-200 md:text-lg">{lede}</p> : null}
        {children ? <div className="mt-6 flex flex-wrap gap-3">{children}</div> : null}
      </div>
    </div>
  );
}

/** The content area under a PageHeader. */
export function PageBody({ children, className }: { children: ReactNode; className?: string }) {
  return <div className={`mx-auto max-w-page px-gutter py-8 md:py-12 ${className ?? ""}`}>{children}</div>;
}
