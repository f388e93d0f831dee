import type { ReactNode } from "react";
import { cx } from "./cx";

type Tone = "danger" | "success" | "info";

const tones: Record<Tone, string> = {
  danger: "border-danger-700/40 bg-danger-100 text-danger-700",
  success: "border-success-700/40 bg-success-100 text-success-700",
  info: "border-quench-500/40 bg-quench-100 text-quench-800",
};

interface AlertProps {
  tone?: Tone;
  title?: string;
  children?: ReactNode;
  className?: string;
}

/** A message box. Danger alerts are announced immediately (role="alert"); others politely. */
export function Alert({ tone = "info", title, children, className }: AlertProps) {
  return (
    <div
      role={tone === "danger" ? "alert" : "status"}
      className={cx("rounded-md border px-4 py-3 text-sm", tones[tone], className)}
    >
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={title ? "mt-1" : undefined}>{children}</div> : null}
    </div>
  );
}
