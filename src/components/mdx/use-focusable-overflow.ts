import { useEffect, type RefObject } from "react";

const SCROLLERS = ".katex-display, .formula-body";

/**
 * Wide display formulas scroll sideways on phones; a scrolling region must be reachable
 * by keyboard (WCAG 2.1.1), so each one that actually overflows becomes focusable.
 */
export function useFocusableOverflow(container: RefObject<HTMLElement | null>, ready: boolean): void {
  useEffect(() => {
    const root = container.current;
    if (!ready || !root) return;
    const update = () => {
      for (const el of root.querySelectorAll<HTMLElement>(SCROLLERS)) {
        if (el.scrollWidth > el.clientWidth + 1) {
          el.tabIndex = 0;
          el.setAttribute("role", "group");
          el.setAttribute("aria-label", "Formula (scrolls sideways)");
        } else if (el.getAttribute("role") === "group" && el.classList.contains("katex-display")) {
          el.removeAttribute("tabindex");
          el.removeAttribute("role");
          el.removeAttribute("aria-label");
        }
      }
    };
    update();
    const observer = typeof ResizeObserver === "undefined" ? null : new ResizeObserver(update);
    observer?.observe(root);
    return () => observer?.disconnect();
  }, [container, ready]);
}
