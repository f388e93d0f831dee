import { useLessonContext } from "./lesson-context";

/** The <Quiz /> tag: the lesson's quiz (from its frontmatter), drawn by the lesson page. */
export function Quiz() {
  const lesson = useLessonContext();
  if (!lesson?.quizId) return <p className="sim-error">This lesson has no quiz yet.</p>;
  return <div className="quiz-slot not-prose">{lesson.renderQuiz(lesson.quizId)}</div>;
}
