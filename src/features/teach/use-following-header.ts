/**
 * Keeps a wide table's header row in view while the page scrolls, and tells whether the table
 * has more columns to the left or right.
 *
 * Why not `position: sticky; top`: the table scrolls sideways in its own box (phones, many
 * quizzes), and a box with `overflow-x: auto` becomes the sticky container for both axes, so the
 * header would stick to the box, not the page. The table grows with the page instead (every
 * student reachable by scrolling the page) and the header cells are moved down by a CSS variable
 * (`--head-y`) set here. The first column still sticks natively (horizontal axis).
 */
import { useEffect, useRef, useState, type RefObject } from "react";

/** How far (px) to move the header down so it sits under the page's sticky bar, never past the table's end. */
export function followingHeaderOffsetPx({ insetTopPx, boxTopPx, boxHeightPx, headHeightPx }: { insetTopPx: number; boxTopPx: number; boxHeightPx: number; headHeightPx: number }): number {
  const wanted = insetTopPx - boxTopPx;
  const limit = Math.max(0, boxHeightPx - headHeightPx * 2); // keep at least one row's worth under it
  return Math.round(Math.min(Math.max(0, wanted), limit));
}

/** Bottom edge (px from the viewport top) of the page's own sticky or fixed top bars, e.g. the site header. */
function stickyInsetTopPx(): number {
  let inset = 0;
  for (const el of document.querySelectorAll("body header")) {
    const style = getComputedStyle(el);
    if ((style.position === "sticky" || style.position === "fixed") && parseFloat(style.top) === 0) {
      inset = Math.max(inset, el.getBoundingClientRect().bottom);
    }
  }
  return inset;
}

export interface SideOverflow {
  left: boolean;
  right: boolean;
}

export function useFollowingHeader<T extends HTMLElement>(): { boxRef: RefObject<T | null>; overflow: SideOverflow } {
  const boxRef = useRef<T>(null);
  const [overflow, setOverflow] = useState<SideOverflow>({ left: false, right: false });

  useEffect(() => {
    const box = boxRef.current;
    if (!box) return;
    let frame = 0;
    const update = () => {
      frame = 0;
      const head = box.querySelector("thead");
      const offset = followingHeaderOffsetPx({
        insetTopPx: stickyInsetTopPx(),
        boxTopPx: box.getBoundingClientRect().top,
        boxHeightPx: box.clientHeight,
        headHeightPx: head instanceof HTMLElement ? head.offsetHeight : 0,
      });
      box.style.setProperty("--head-y", `${offset}px`);
      const left = box.scrollLeft > 1;
      const right = box.scrollLeft + box.clientWidth < box.scrollWidth - 1;
      setOverflow((old) => (old.left === left && old.right === right ? old : { left, right }));
    };
    const schedule = () => {
      if (!frame) frame = requestAnimationFrame(update);
    };
    update();
    window.addEventListener("scroll", schedule, { passive: true });
    window.addEventListener("resize", schedule);
    box.addEventListener("scroll", schedule, { passive: true });
    const resize = new ResizeObserver(schedule);
    resize.observe(box);
    if (box.firstElementChild) resize.observe(box.firstElementChild);
    return () => {
      cancelAnimationFrame(frame);
      window.removeEventListener("scroll", schedule);
      window.removeEventListener("resize", schedule);
      box.removeEventListener("scroll", schedule);
      resize.disconnect();
    };
  }, []);

  return { boxRef, overflow };
}
