import { useId, useState } from "react";
import { useLessonContext } from "./lesson-context";

interface CheckProps {
  id: string;
  question: string;
  options: string[];
  answer: number;
  explain?: string;
}

/** A "check yourself" question: answered in the page, saved as progress, never graded. */
export function Check({ id, question, options, answer, explain }: CheckProps) {
  const lesson = useLessonContext();
  const saved = lesson?.checks[id];
  const [choice, setChoice] = useState<number | null>(saved?.choice ?? null);
  const [revealed, setRevealed] = useState(saved !== undefined);
  const name = useId();
  const correct = choice === answer;

  const submit = () => {
    if (choice === null) return;
    setRevealed(true);
    lesson?.saveCheck(id, { choice, correct: choice === answer });
  };

  return (
    <section className="check not-prose" aria-labelledby={`${name}-q`}>
      <p className="check-kicker">Check yourself</p>
      <fieldset>
        <legend id={`${name}-q`} className="check-question">
          {question}
        </legend>
        <div className="check-options">
          {options.map((option, index) => {
            const state = revealed ? (index === answer ? "right" : index === choice ? "wrong" : "idle") : "idle";
            return (
              <label key={index} className="check-option" data-state={state}>
                <input
                  type="radio"
                  name={name}
                  value={index}
                  checked={choice === index}
                  onChange={() => {
                    setChoice(index);
                    setRevealed(false);
                  }}
                />
                <span>{option}</span>
              </label>
            );
          })}
        </div>
      </fieldset>
      <div className="check-actions">
        <button type="button" className="check-button" onClick={submit} disabled={choice === null}>
          Check my answer
        </button>
      </div>
      <div aria-live="polite">
        {revealed && choice !== null ? (
          <div className="check-feedback" data-correct={correct ? "true" : "false"}>
            <p className="check-verdict">{correct ? "Right." : `Not quite — the answer is “${options[answer]}”.`}</p>
            {explain ? <p>{explain}</p> : null}
          </div>
        ) : null}
      </div>
    </section>
  );
}
