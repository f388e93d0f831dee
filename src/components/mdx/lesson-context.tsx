/**
 * What registered tags need from the page around them: which lesson this is, the saved
 * check answers, how to save one, and how to draw the lesson's quiz. The lesson page
 * (features/lessons) provides it; components/ never imports features/.
 */
import { createContext, useContext, type ReactNode } from "react";
import type { CheckAnswer } from "@shared/api/lessons";

export interface LessonContextValue {
  lessonSlug: string;
  quizId: string | null;
  checks: Record<string, CheckAnswer>;
  saveCheck(id: string, answer: CheckAnswer): void;
  renderQuiz(quizId: string): ReactNode;
}

const LessonContext = createContext<LessonContextValue | null>(null);

export const LessonContextProvider = LessonContext.Provider;

/** The lesson around a tag, or null when a tag is rendered outside a lesson (e.g. a preview). */
export function useLessonContext(): LessonContextValue | null {
  return useContext(LessonContext);
}
