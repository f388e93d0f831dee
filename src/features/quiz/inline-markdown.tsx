import katex from "katex";
import { Fragment, type ReactNode } from "react";

/**
 * Quiz prompts and options are plain text with a little inline Markdown:
 * **bold**, *italic*, `code` and $TeX$. No HTML is ever interpreted.
 */
const TOKEN = /(\$[^$\n]+\$|\*\*[^*\n]+\*\*|\*[^*\n]+\*|`[^`\n]+`)/g;

export function InlineMarkdown({ text }: { text: string }) {
  const parts = text.split(TOKEN);
  return (
    <>
      {parts.map((part, i): ReactNode => {
        if (part.startsWith("$") && part.endsWith("$") && part.length > 2) {
          const html = katex.renderToString(part.slice(1, -1), { throwOnError: false, output: "htmlAndMathml" });
          return <span key={i} dangerouslySetInnerHTML={{ __html: html }} />;
        }
        if (part.startsWith("**") && part.endsWith("**") && part.length > 4) return <strong key={i}>{part.slice(2, -2)}</strong>;
        if (part.startsWith("*") && part.endsWith("*") && part.length > 2) return <em key={i}>{part.slice(1, -1)}</em>;
        if (part.startsWith("`") && part.endsWith("`") && part.length > 2) return <code key={i} className="rounded-xs bg-bone-100 px-1 font-mono text-[0.9em]">{part.slice(1, -1)}</code>;
        return <Fragment key={i}>{part}</Fragment>;
      })}
    </>
  );
}
