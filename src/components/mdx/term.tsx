import { useEffect, useId, useLayoutEffect, useRef, useState, type ReactNode } from "react";
import { glossaryEntry } from "./glossary";

/**
 * A glossary term: its definition appears on hover, on keyboard focus and on tap, and is
 * tied to the term with aria-describedby so screen readers announce it. Escape closes it.
 */
export function Term({ id, children }: { id: string; children?: ReactNode }) {
  const entry = glossaryEntry(id);
  const tipId = useId();
  const [open, setOpen] = useState(false);
  const [shiftPx, setShiftPx] = useState(0);
  const tip = useRef<HTMLSpanElement>(null);
  const wrap = useRef<HTMLSpanElement>(null);

  // Keep the bubble inside the viewport on narrow screens.
  useLayoutEffect(() => {
    if (!open || !tip.current) return;
    setShiftPx(0);
    const rect = tip.current.getBoundingClientRect();
    const margin = 8;
    if (rect.right > window.innerWidth - margin) setShiftPx(window.innerWidth - margin - rect.right);
    else if (rect.left < margin) setShiftPx(margin - rect.left);
  }, [open]);

  useEffect(() => {
    if (!open) return;
    const onKey = (event: KeyboardEvent) => event.key === "Escape" && setOpen(false);
    const onPointer = (event: PointerEvent) => {
      if (wrap.current && !wrap.current.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener("keydown", onKey);
    document.addEventListener("pointerdown", onPointer);
    return () => {
      document.removeEventListener("keydown", onKey);
      document.removeEventListener("pointerdown", onPointer);
    };
  }, [open]);

  if (!entry) return <span className="term-missing">{children}</span>;

  return (
    <span ref={wrap} className="term" onMouseEnter={() => setOpen(true)} onMouseLeave={() => setOpen(false)}>
      <button
        type="button"
        className="term-trigger"
        aria-describedby={tipId}
        aria-expanded={open}
        onFocus={() => setOpen(true)}
        onBlur={() => setOpen(false)}
        onClick={() => setOpen((value) => !value)}
      >
        {children}
      </button>
      <span
        ref={tip}
        id={tipId}
        role="tooltip"
        className="term-tip"
        data-open={open ? "true" : "false"}
        style={shiftPx ? { transform: `translateX(calc(-50% + ${shiftPx}px))` } : undefined}
      >
        <span className="term-tip-title">{entry.term}</span> {entry.definition}
      </span>
    </span>
  );
}
