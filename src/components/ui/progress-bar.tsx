import { cx } from "./cx";

/** A thin bar like a temper gauge; the number is given in text next to it. */
export function ProgressBar({ share, label, tone = "quench" }: { share: number; label: string; tone?: "quench" | "ember" | "success" }) {
  const color = tone === "ember" ? "bg-ember-500" : tone === "success" ? "bg-success-700" : "bg-quench-500";
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={Math.round(share * 100)}
      className="h-1.5 w-full min-w-16 overflow-hidden rounded-full bg-bone-200"
    >
      <div className={cx("h-full rounded-full", color)} style={{ width: `${Math.max(0, Math.min(1, share)) * 100}%` }} />
    </div>
  );
}
