/**
 * The seed of a learner's n-th attempt at a quiz, derived with HMAC from the server
 * secret: the same for every GET until that attempt is submitted (so reloading the
 * page does not re-draw the numbers), different for every attempt, and not
 * predictable by the learner. Nothing is written on GET.
 */
import { createHmac } from "node:crypto";

export function attemptSeed(secret: string, userId: number, quizId: string, drawNumber: number): number {
  const digest = createHmac("sha256", secret).update(`quiz-draw:${userId}:${quizId}:${drawNumber}`).digest();
  // 31 bits: a positive SQLite INTEGER and a valid createRandom seed.
  return digest.readUInt32BE(0) & 0x7fffffff;
}

/** True when any question draws parameters, i.e. when the seed changes what is asked. */
export function isParameterised(questions: readonly { kind: string; params?: unknown }[]): boolean {
  return questions.some((q) => q.kind === "numeric" && q.params !== undefined && Object.keys(q.params as object).length > 0);
}
