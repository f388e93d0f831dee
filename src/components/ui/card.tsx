import type { HTMLAttributes, ReactNode } from "react";
import { cx } from "./cx";

export function Card({ className, ...rest }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cx("rounded-lg border border-bone-300 bg-white p-5 shadow-card", className)} {...rest} />;
}

interface CardHeadingProps {
  eyebrow?: string;
  title: ReactNode;
  id?: string;
  level?: 2 | 3;
}

export function CardHeading({ eyebrow, title, id, level = 2 }: CardHeadingProps) {
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <div className="mb-4">
      {eyebrow ? <p className="eyebrow text-ember-700">{eyebrow}</p> : null}
      <Heading id={id} className="mt-1 text-xl font-semibold text-soot-900">
        {title}
      </Heading>
    </div>
  );
}
