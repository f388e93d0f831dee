import type { LessonSection } from "@shared/api/lessons";
import { cx } from "@/components/ui/cx";

interface TocProps {
  sections: LessonSection[];
  current: string | null;
  reached: ReadonlySet<string>;
  className?: string;
}

/** The lesson's `##` sections: where you are, and which you have read. */
export function TableOfContents({ sections, current, reached, className }: TocProps) {
  return (
    <nav aria-label="Lesson contents" className={className}>
      <p className="eyebrow text-soot-600">In this lesson</p>
      <ol className="mt-3 space-y-0.5 border-l border-bone-300 text-sm">
        {sections.map((section) => {
          const active = section.id === current;
          const done = reached.has(section.id);
          return (
            <li key={section.id}>
              <a
                href={`#${section.id}`}
                aria-current={active ? "location" : undefined}
                className={cx(
                  "-ml-px flex items-start gap-2 border-l-2 py-1.5 pl-3 pr-1 leading-snug transition-colors",
                  active ? "border-ember-500 font-semibold text-soot-950" : "border-transparent text-soot-700 hover:border-soot-500 hover:text-soot-950",
                )}
              >
                <span
                  aria-hidden="true"
                  className={cx("mt-1.5 size-2 shrink-0 rounded-full border", done ? "border-quench-600 bg-quench-600" : "border-soot-500 bg-transparent")}
                />
                <span>
                  {section.title}
                  {done ? <span className="sr-only"> (read)</span> : null}
                </span>
              </a>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
