import { useEffect, useState, type RefObject } from "react";

/**
 * Watches the lesson's `##` headings: a section counts as reached when its heading
 * passes into the upper part of the screen, and the last one passed is "current"
 * (highlighted in the table of contents).
 */
export function useSectionTracking(container: RefObject<HTMLElement | null>, ready: boolean, onReached: (id: string) => void): string | null {
  const [current, setCurrent] = useState<string | null>(null);

  useEffect(() => {
    const root = container.current;
    if (!ready || !root || typeof IntersectionObserver === "undefined") return;
    const headings = Array.from(root.querySelectorAll<HTMLElement>("h2[data-section]"));
    if (headings.length === 0) return;
    const observer = new IntersectionObserver(
      (entries) => {
        for (const entry of entries) {
          const id = entry.target.getAttribute("data-section");
          if (!id) continue;
          // Reached when it enters the top 60 % of the viewport, or has already scrolled past it.
          if (entry.isIntersecting || entry.boundingClientRect.top < 0) {
            onReached(id);
          }
        }
        // Current = the last heading above the 40 % line.
        const line = window.innerHeight * 0.4;
        let active: string | null = null;
        for (const heading of headings) if (heading.getBoundingClientRect().top <= line) active = heading.getAttribute("data-section");
        setCurrent(active ?? headings[0].getAttribute("data-section"));
      },
      { rootMargin: "0px 0px -40% 0px", threshold: [0, 1] },
    );
    headings.forEach((heading) => observer.observe(heading));
    return () => observer.disconnect();
  }, [container, ready, onReached]);

  return current;
}
