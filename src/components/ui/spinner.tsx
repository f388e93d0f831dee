/** A small "heating" indicator, with text for assistive technology. */
export function Spinner({ label = "Loading" }: { label?: string }) {
  return (
    <span role="status" className="inline-flex items-center gap-2 text-sm text-soot-600">
      <span
        aria-hidden="true"
        className="size-4 animate-spin rounded-full border-2 border-ember-500/30 border-t-ember-500"
      />
      {label}…
    </span>
  );
}
