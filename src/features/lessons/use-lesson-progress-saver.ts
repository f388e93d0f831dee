/**
 * Saves reading progress without flooding the server: the lesson opening at once,
 * sections reached in small batches, check answers immediately.
 */
import { useCallback, useEffect, useRef } from "react";
import type { CheckAnswer } from "@shared/api/lessons";
import { useUpdateLessonProgress } from "@/api/lessons";

const BATCH_MS = 1500;

export function useLessonProgressSaver(lessonSlug: string, knownSections: readonly string[]) {
  const { mutate } = useUpdateLessonProgress(lessonSlug);
  const pending = useRef<{ sections: Set<string>; last: string | null }>({ sections: new Set(), last: null });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const known = useRef(new Set(knownSections));
  known.current = new Set(knownSections);

  const flush = useCallback(() => {
    timer.current = null;
    const { sections, last } = pending.current;
    if (sections.size === 0 && last === null) return;
    pending.current = { sections: new Set(), last: null };
    mutate({ sectionsReached: [...sections], ...(last ? { lastSection: last } : {}) });
  }, [mutate]);

  // Opening the lesson is progress too.
  useEffect(() => {
    mutate({});
  }, [lessonSlug, mutate]);

  // Send what is pending when the reader leaves.
  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
    flush();
  }, [flush]);

  const sectionReached = useCallback(
    (id: string) => {
      // Only the lesson's own `##` sections count (not e.g. the Sources heading).
      if (!known.current.has(id)) return;
      pending.current.sections.add(id);
      pending.current.last = id;
      timer.current ??= setTimeout(flush, BATCH_MS);
    },
    [flush],
  );

  const saveCheck = useCallback((id: string, answer: CheckAnswer) => mutate({ checks: { [id]: answer } }), [mutate]);

  return { sectionReached, saveCheck };
}
