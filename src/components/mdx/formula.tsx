import katex from "katex";
import { useMemo } from "react";

interface FormulaProps {
  tex: string;
  label?: string;
}

/** A displayed, labelled formula typeset with KaTeX (its MathML copy is what screen readers read). */
export function Formula({ tex, label }: FormulaProps) {
  const html = useMemo(() => katex.renderToString(tex, { displayMode: true, throwOnError: false, output: "htmlAndMathml" }), [tex]);
  return (
    <figure className="formula not-prose" role="group" aria-label={label ?? "Formula"}>
      {label ? <figcaption className="formula-label">{label}</figcaption> : null}
      {/* KaTeX output is generated from the lesson's own TeX, never from user input. */}
      <div className="formula-body" dangerouslySetInnerHTML={{ __html: html }} />
    </figure>
  );
}
