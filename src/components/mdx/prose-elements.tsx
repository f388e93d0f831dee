/** Markdown elements in lessons: headings with anchors, app-aware links and scrollable tables. */
import type { AnchorHTMLAttributes, HTMLAttributes, TableHTMLAttributes } from "react";
import { Link } from "react-router";

type HeadingProps = HTMLAttributes<HTMLHeadingElement>;

function SectionAnchor({ id }: { id?: string }) {
  if (!id) return null;
  return (
    <a href={`#${id}`} className="heading-anchor" aria-hidden="true" tabIndex={-1}>
      #
    </a>
  );
}

export function H2({ id, children, ...rest }: HeadingProps) {
  return (
    <h2 id={id} data-section={id} {...rest}>
      {children}
      <SectionAnchor id={id} />
    </h2>
  );
}

export function H3({ id, children, ...rest }: HeadingProps) {
  return (
    <h3 id={id} {...rest}>
      {children}
      <SectionAnchor id={id} />
    </h3>
  );
}

/** Links inside the app go through the router; outside links open in a new tab and say so. */
export function LessonLink({ href = "", children, ...rest }: AnchorHTMLAttributes<HTMLAnchorElement>) {
  if (href.startsWith("/") && !href.startsWith("//")) {
    return (
      <Link to={href} {...rest}>
        {children}
      </Link>
    );
  }
  if (/^(https?:)?\/\//i.test(href)) {
    return (
      <a href={href} target="_blank" rel="noreferrer" className="external-link" {...rest}>
        {children}
        <span className="sr-only"> (opens in a new tab)</span>
      </a>
    );
  }
  return (
    <a href={href} {...rest}>
      {children}
    </a>
  );
}

/** Wide tables scroll inside their own focusable region instead of widening the page. */
export function LessonTable(props: TableHTMLAttributes<HTMLTableElement>) {
  return (
    <div className="table-scroll" role="region" aria-label="Table" tabIndex={0}>
      <table {...props} />
    </div>
  );
}
