/**
 * The quiz engine: grading of every question kind (pure), and the quiz API —
 * answer keys absent from the question payload, idempotent retries, attempt
 * limits under concurrent submissions, own history only.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { AttemptHistory, AttemptResult, PublicNumericQuestion, QuizAnswer, QuizView } from "../../shared/api/quizzes";
import { chromiumAtomFraction } from "../../shared/metallurgy";
import type { NumericQuestion, QuestionDefinition, SimulationTaskQuestion } from "../../shared/quiz/definition";
import { drawOnGrid, drawParams, substitutePrompt } from "../../server/quiz/draw";
import { gradeQuestion, gradeQuiz } from "../../server/quiz/grade";
import type { MultipleChoiceQuestion } from "../../shared/quiz/definition";
import { presentQuiz } from "../../server/quiz/present";
import { loadSimSchemas } from "../../server/quiz/sim-params";
import { createRandom } from "../../shared/metallurgy/random";
import fixtureQuiz from "../content/fixtures/course/quizzes/fixture-quiz";
import { createTestApp, type TestApp } from "../support/test-app";
import { cohortWithLimit, newKey, newStudent, seedFixtureModule } from "./course-fixture";

const question = <K extends QuestionDefinition["kind"]>(id: string) => fixtureQuiz.questions.find((q) => q.id === id) as Extract<QuestionDefinition, { kind: K }>;
const numeric = (value: number, unit: string): QuizAnswer => ({ kind: "numeric", value, unit });

describe("grading, question by question", () => {
  it("single choice: right, wrong with the option's feedback, unanswered", () => {
    const q = question<"single">("q-single");
    expect(gradeQuestion(q, { kind: "single", choice: "austenite" }, 1)).toMatchObject({ correct: true, pointsAwarded: 1 });
    const wrong = gradeQuestion(q, { kind: "single", choice: "ferrite" }, 1);
    expect(wrong).toMatchObject({ correct: false, pointsAwarded: 0, given: "Ferrite", correctAnswer: "Austenite" });
    expect(wrong.feedback).toMatch(/body-centred/);
    expect(gradeQuestion(q, undefined, 1)).toMatchObject({ correct: false, feedback: "Not answered." });
    expect(gradeQuestion(q, { kind: "multiple", choices: ["austenite"] }, 1).correct).toBe(false);
  });

  it("multiple choice: all and only the right options", () => {
    const q = question<"multiple">("q-multiple");
    expect(gradeQuestion(q, { kind: "multiple", choices: ["cr", "v"] }, 1).correct).toBe(true);
    const missing = gradeQuestion(q, { kind: "multiple", choices: ["v"] }, 1);
    expect(missing.correct).toBe(false);
    expect(missing.feedback).toMatch(/Missed 1/);
    const extra = gradeQuestion(q, { kind: "multiple", choices: ["v", "cr", "ni"] }, 1);
    expect(extra.correct).toBe(false);
    expect(extra.feedback).toMatch(/Nickel does not form carbides/);
  });

  it("multiple choice: lists several sentence options on one line without a stray full stop before each separator", () => {
    const q: MultipleChoiceQuestion = {
      id: "q-sentences",
      kind: "multiple",
      prompt: "Which are true?",
      explanation: "",
      options: [
        { id: "a", text: "Chromium forms a film." },
        { id: "b", text: "Carbon ties up chromium." },
        { id: "c", text: "Nickel forms carbides." },
      ],
      answers: ["a", "b"],
    };
    const r = gradeQuestion(q, { kind: "multiple", choices: ["a", "c"] }, 1);
    expect(r.correctAnswer).toBe("Chromium forms a film; Carbon ties up chromium");
    expect(r.given).toBe("Chromium forms a film; Nickel forms carbides");
  });

  it("numeric: within and outside the tolerance", () => {
    // Eutectoid temperature 727 °C (science-reference §5.2, Callister and ASM [Checked]); tolerance ±2 °C.
    const q = question<"numeric">("q-eutectoid");
    expect(gradeQuestion(q, numeric(727, "degC"), 1).correct).toBe(true);
    expect(gradeQuestion(q, numeric(728.9, "degC"), 1).correct).toBe(true);
    expect(gradeQuestion(q, numeric(725.1, "degC"), 1).correct).toBe(true);
    const outside = gradeQuestion(q, numeric(729.5, "degC"), 1);
    expect(outside.correct).toBe(false);
    expect(outside.feedback).toMatch(/Off by 2\.5 °C/);
  });

  it("numeric: converts physical units with mathjs and catches K/°C mix-ups", () => {
    const q = question<"numeric">("q-eutectoid");
    // 727 °C = 1000.15 K; an answer in K from the unit menu is converted, not compared raw.
    expect(gradeQuestion(q, numeric(1000.15, "K"), 1).correct).toBe(true);
    expect(gradeQuestion(q, numeric(1000, "K"), 1).correct).toBe(true);
    const kAsC = gradeQuestion(q, numeric(1000, "degC"), 1);
    expect(kAsC.correct).toBe(false);
    expect(kAsC.feedback).toMatch(/right in K, but you chose °C/);
    const cAsK = gradeQuestion(q, numeric(727, "K"), 1);
    expect(cAsK.correct).toBe(false);
    expect(cAsK.feedback).toMatch(/right in °C, but you chose K/);
    // A unit that is not on the question's menu is never accepted, even if convertible.
    expect(gradeQuestion(q, numeric(1340.6, "degF"), 1)).toMatchObject({ correct: false });
  });

  it("numeric: time units h / min / s convert; a number in the wrong one is flagged", () => {
    const q = question<"numeric">("q-soak");
    const hours = drawParams(q, 5).hours;
    expect(gradeQuestion(q, numeric(hours * 60, "min"), 5).correct).toBe(true);
    expect(gradeQuestion(q, numeric(hours, "h"), 5).correct).toBe(true);
    expect(gradeQuestion(q, numeric(hours * 3600, "s"), 5).correct).toBe(true);
    // 1 % relative tolerance: 0.5 % off passes, 2 % off does not.
    expect(gradeQuestion(q, numeric(hours * 60 * 1.005, "min"), 5).correct).toBe(true);
    expect(gradeQuestion(q, numeric(hours * 60 * 1.02, "min"), 5).correct).toBe(false);
    const mixed = gradeQuestion(q, numeric(hours * 60, "h"), 5);
    expect(mixed.correct).toBe(false);
    expect(mixed.feedback).toMatch(/right in min/);
  });

  it("labels such as HRC or % match exactly and never convert", () => {
    const q: NumericQuestion = {
      id: "hrc",
      kind: "numeric",
      prompt: "Hardness?",
      compute: () => 64,
      unit: "HRC",
      tolerance: { abs: 1 },
      explanation: "x",
    };
    expect(gradeQuestion(q, numeric(64, "HRC"), 1).correct).toBe(true);
    expect(gradeQuestion(q, numeric(64, "HV"), 1).correct).toBe(false);
  });

  it("parameterised: each seed draws its own value on the grid, replayably, and the key is the core's value", () => {
    const q = question<"numeric">("q-atom-fraction");
    const seen = new Set<number>();
    for (let seed = 1; seed <= 60; seed += 1) {
      const { crMassPct } = drawParams(q, seed);
      expect(drawParams(q, seed).crMassPct).toBe(crMassPct);
      expect(crMassPct).toBeGreaterThanOrEqual(10);
      expect(crMassPct).toBeLessThanOrEqual(20);
      expect(Number.isInteger(crMassPct * 2)).toBe(true);
      seen.add(crMassPct);
      const prompt = substitutePrompt(q, { crMassPct });
      expect(prompt).toContain(`${crMassPct.toFixed(1)} wt% Cr`);
      // Graded against the science core, computed here independently of the question's compute().
      const core = chromiumAtomFraction(crMassPct);
      expect(gradeQuestion(q, numeric(core, "1"), seed).correct).toBe(true);
      expect(gradeQuestion(q, numeric(core + 0.0025, "1"), seed).correct).toBe(false);
    }
    expect(seen.size).toBeGreaterThan(10);
  });

  it("parameterised: the key agrees with a published check value", () => {
    // x_Cr for 12 wt% Cr = 0.1277 ± 2e-4 (science-reference §1a check 2, [Computed]).
    const q: NumericQuestion = { ...question<"numeric">("q-atom-fraction"), params: { crMassPct: { min: 12, max: 12, step: 1 } } };
    expect(gradeQuestion(q, numeric(0.1277, "1"), 3).correct).toBe(true);
    expect(gradeQuestion(q, numeric(0.1308, "1"), 3).correct).toBe(false);
    expect(gradeQuestion(q, numeric(0.1277, "1"), 3).working).toMatch(/crMassPct = 12/);
  });

  it("draws uniformly over the grid", () => {
    const random = createRandom(99);
    const counts = new Map<number, number>();
    for (let i = 0; i < 4000; i += 1) {
      const v = drawOnGrid({ min: 0, max: 1, step: 0.25 }, random);
      counts.set(v, (counts.get(v) ?? 0) + 1);
    }
    expect([...counts.keys()].sort()).toEqual([0, 0.25, 0.5, 0.75, 1]);
    for (const n of counts.values()) expect(n).toBeGreaterThan(650); // 800 expected each
  });

  it("sim task: recomputed with the core from the submitted simulation state", async () => {
    const q = question<"sim-task">("q-sim") as SimulationTaskQuestion;
    const simSchemas = await loadSimSchemas(["passive-film"]);
    expect(simSchemas.has("passive-film")).toBe(true);
    // EN 10088-1: stainless means Cr ≥ 10.5 and C ≤ 1.2 (science-reference §1a check 1, [Checked]).
    const right = gradeQuestion(q, { kind: "sim-task", params: { crMassPct: 10.5, cMassPct: 0.08 } }, 1, { simSchemas });
    expect(right).toMatchObject({ correct: true });
    expect(right.working).toMatch(/meets/);
    expect(gradeQuestion(q, { kind: "sim-task", params: { crMassPct: 10.4, cMassPct: 0.05 } }, 1, { simSchemas }).correct).toBe(false);
    // The simulation's own schema rejects impossible settings before check() sees them.
    const invalid = gradeQuestion(q, { kind: "sim-task", params: { crMassPct: 45 } }, 1, { simSchemas });
    expect(invalid.correct).toBe(false);
    expect(invalid.feedback).toMatch(/not valid/);
    // Defaults from the schema fill what was not submitted (cMassPct defaults below 1.2).
    expect(gradeQuestion(q, { kind: "sim-task", params: { crMassPct: 13 } }, 1, { simSchemas }).correct).toBe(true);
  });

  it("a whole quiz: score, maximum and pass mark", () => {
    const all = gradeQuiz(fixtureQuiz, {}, 1);
    expect(all).toMatchObject({ score: 0, maxScore: 6, passed: false });
    const half = gradeQuiz(fixtureQuiz, { "q-single": { kind: "single", choice: "austenite" }, "q-multiple": { kind: "multiple", choices: ["v", "cr"] }, "q-eutectoid": numeric(727, "degC") }, 1);
    expect(half).toMatchObject({ score: 3, passed: true }); // passFraction 0.5
  });
});

// ---------------------------------------------------------------------------------------------

let t: TestApp;
let moduleId: number;

beforeAll(async () => {
  t = await createTestApp();
  moduleId = await seedFixtureModule(t);
});
afterAll(() => t?.cleanup());

type Session = Awaited<ReturnType<typeof newStudent>>;

async function view(s: Session, quizId = "fixture-quiz"): Promise<QuizView> {
  const res = await s.agent.get(`/api/quizzes/${quizId}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as QuizView;
}

function submit(s: Session, quizId: string, body: object) {
  return s.agent.post(`/api/quizzes/${quizId}/attempts`).set("x-csrf-token", s.csrfToken).send(body);
}

/** Right answers worked out from what the learner sees (drawn values read from the prompts) and the core. */
function rightAnswers(v: QuizView): Record<string, QuizAnswer> {
  const prompt = (id: string) => (v.questions.find((q) => q.id === id) as PublicNumericQuestion).prompt;
  const crMassPct = Number(/with ([\d.]+) wt% Cr/.exec(prompt("q-atom-fraction"))![1]);
  const hours = Number(/lasts ([\d.]+) h/.exec(prompt("q-soak"))![1]);
  return {
    "q-single": { kind: "single", choice: "austenite" },
    "q-multiple": { kind: "multiple", choices: ["cr", "v"] },
    "q-eutectoid": numeric(1000.15, "K"),
    "q-atom-fraction": numeric(chromiumAtomFraction(crMassPct), "1"),
    "q-soak": numeric(hours, "h"),
    "q-sim": { kind: "sim-task", params: { crMassPct: 12.5, cMassPct: 0.1 } },
  };
}

describe("GET /api/quizzes/:id", () => {
  it("needs a signed-in user and a known quiz", async () => {
    expect((await request(t.app).get("/api/quizzes/fixture-quiz")).status).toBe(401);
    const s = await newStudent(t);
    const missing = await s.agent.get("/api/quizzes/no-such-quiz");
    expect(missing.status).toBe(404);
    expect(missing.body.error.code).toBe("not_found");
    expect((await s.agent.get("/api/quizzes/Not_A_Slug!")).status).toBe(400);
  });

  it("sends questions with drawn values but no answer key, explanation, feedback or function", async () => {
    const s = await newStudent(t);
    const v = await view(s);
    const json = JSON.stringify(v);
    expect(v.questions.map((q) => q.id)).toEqual(fixtureQuiz.questions.map((q) => q.id));
    for (const secret of ["SECRET-EXPLANATION", "explanation", "feedback", "answer", "compute", "exampleSolution", "expression", "tolerance", "body-centred", "carbide formers", "isStainless"]) {
      expect(json, `payload leaks “${secret}”`).not.toContain(secret);
    }
    for (const q of fixtureQuiz.questions) {
      if (q.explanation) expect(json).not.toContain(q.explanation);
    }
    // The numeric keys themselves are not there either (the eutectoid 727, the drawn atom fraction).
    expect(json).not.toMatch(/727/);
    const crMassPct = Number(/with ([\d.]+) wt% Cr/.exec(json)![1]);
    expect(json).not.toContain(chromiumAtomFraction(crMassPct).toFixed(4));
    expect(json).not.toContain(chromiumAtomFraction(crMassPct).toFixed(3));
    // Placeholders are filled in; the unit menu is offered.
    expect(json).not.toMatch(/\{crMassPct\}|\{hours\}/);
    const eutectoid = v.questions.find((q) => q.id === "q-eutectoid") as PublicNumericQuestion;
    expect(eutectoid.units).toEqual(["degC", "K"]);
    expect(v).toMatchObject({ drawId: 1, attempts: { used: 0, limit: null, remaining: null }, quiz: { maxScore: 6, passFraction: 0.5 } });
  });

  it("shows the same numbers on every reload until the attempt is submitted, without writing anything", async () => {
    const s = await newStudent(t);
    const before = await t.db.read(() => t.db.models.QuizAttempt.count());
    const a = await view(s);
    const b = await view(s);
    expect(b.questions).toEqual(a.questions);
    expect(await t.db.read(() => t.db.models.QuizAttempt.count())).toBe(before);
  });
});

describe("POST /api/quizzes/:id/attempts", () => {
  it("grades right answers as right (values read from the prompts, keys from the core) and stores the attempt", async () => {
    const s = await newStudent(t);
    const v = await view(s);
    const res = await submit(s, "fixture-quiz", { idempotencyKey: newKey(), drawId: v.drawId, answers: rightAnswers(v) });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const attempt = res.body as AttemptResult;
    expect(attempt.results.filter((r) => !r.correct)).toEqual([]);
    expect(attempt).toMatchObject({ score: 6, maxScore: 6, passed: true, quizId: "fixture-quiz" });
    // The result, and only the result, carries the explanations.
    expect(attempt.results.find((r) => r.questionId === "q-single")!.explanation).toMatch(/SECRET-EXPLANATION-single/);
    expect(attempt.questions).toEqual(v.questions);
    const rows = await t.db.read(() => t.db.models.QuizAttempt.findAll({ where: { userId: s.user.id } }));
    expect(rows).toHaveLength(1);
    expect(rows[0].score).toBe(6);
  });

  it("marks wrong answers and says why", async () => {
    const s = await newStudent(t);
    const v = await view(s);
    const res = await submit(s, "fixture-quiz", {
      idempotencyKey: newKey(),
      drawId: v.drawId,
      answers: { "q-single": { kind: "single", choice: "ferrite" }, "q-eutectoid": numeric(1000, "degC") },
    });
    expect(res.status).toBe(201);
    const byId = new Map((res.body as AttemptResult).results.map((r) => [r.questionId, r]));
    expect(byId.get("q-single")).toMatchObject({ correct: false, feedback: "Ferrite is body-centred cubic." });
    expect(byId.get("q-eutectoid")!.feedback).toMatch(/right in K/);
    expect(byId.get("q-multiple")).toMatchObject({ correct: false, given: "—", feedback: "Not answered." });
    expect(res.body.score).toBe(0);
    expect(res.body.passed).toBe(false);
  });

  it("a retry with the same idempotency key returns the stored attempt and never creates a second", async () => {
    const s = await newStudent(t);
    const v = await view(s);
    const body = { idempotencyKey: newKey(), drawId: v.drawId, answers: rightAnswers(v) };
    const first = await submit(s, "fixture-quiz", body);
    expect(first.status).toBe(201);
    // Sequential retries (a lost response) and a burst of parallel ones (a double click).
    const again = await submit(s, "fixture-quiz", body);
    const burst = await Promise.all(Array.from({ length: 5 }, () => submit(s, "fixture-quiz", body)));
    for (const res of [again, ...burst]) {
      expect(res.status).toBe(200);
      expect(res.body.id).toBe(first.body.id);
      expect(res.body.score).toBe(first.body.score);
    }
    // Even with different answers, the key identifies the stored attempt.
    const changed = await submit(s, "fixture-quiz", { ...body, answers: {} });
    expect(changed.body).toEqual(first.body);
    expect(await t.db.read(() => t.db.models.QuizAttempt.count({ where: { userId: s.user.id } }))).toBe(1);
  });

  it("a first submission whose parallel twins share one key is stored exactly once", async () => {
    const s = await newStudent(t);
    const v = await view(s);
    const body = { idempotencyKey: newKey(), drawId: v.drawId, answers: rightAnswers(v) };
    const results = await Promise.all(Array.from({ length: 6 }, () => submit(s, "fixture-quiz", body)));
    expect(results.map((r) => r.status).sort()).toEqual([200, 200, 200, 200, 200, 201]);
    expect(new Set(results.map((r) => r.body.id)).size).toBe(1);
    expect(await t.db.read(() => t.db.models.QuizAttempt.count({ where: { userId: s.user.id } }))).toBe(1);
  });

  it("a key already used for another quiz is refused", async () => {
    const s = await newStudent(t);
    const key = newKey();
    expect((await submit(s, "fixture-quiz-2", { idempotencyKey: key, drawId: 1, answers: {} })).status).toBe(201);
    const reused = await submit(s, "fixture-quiz", { idempotencyKey: key, drawId: 1, answers: {} });
    expect(reused.status).toBe(409);
    expect(reused.body.error.code).toBe("idempotency_key_reused");
  });

  it("new numbers for every attempt: a graded draw cannot be answered again", async () => {
    const s = await newStudent(t);
    const v1 = await view(s);
    expect((await submit(s, "fixture-quiz", { idempotencyKey: newKey(), drawId: v1.drawId, answers: {} })).status).toBe(201);
    // Resubmitting draw 1 (whose result showed the answers) is refused, with a new key or not.
    const stale = await submit(s, "fixture-quiz", { idempotencyKey: newKey(), drawId: v1.drawId, answers: rightAnswers(v1) });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe("stale_attempt");
    const v2 = await view(s);
    expect(v2.drawId).toBe(2);
    // Over several attempts the drawn values change (24 grid points for hours, 21 for Cr: all-equal is vanishingly unlikely).
    const prompts = [v1, v2].map((v) => v.questions.filter((q) => q.kind === "numeric").map((q) => q.prompt).join("|"));
    let v = v2;
    for (let i = 0; i < 3; i += 1) {
      expect((await submit(s, "fixture-quiz", { idempotencyKey: newKey(), drawId: v.drawId, answers: {} })).status).toBe(201);
      v = await view(s);
      prompts.push(v.questions.filter((q) => q.kind === "numeric").map((q) => q.prompt).join("|"));
    }
    expect(new Set(prompts).size).toBeGreaterThan(1);
    // Each stored attempt's questions still grade against its own draw.
    const history = (await s.agent.get("/api/quizzes/fixture-quiz/attempts")).body as AttemptHistory;
    expect(history.attempts).toHaveLength(4);
  });

  it("validates the body", async () => {
    const s = await newStudent(t);
    const cases = [
      { drawId: 1, answers: {} },
      { idempotencyKey: "short", drawId: 1, answers: {} },
      { idempotencyKey: newKey(), drawId: 0, answers: {} },
      { idempotencyKey: newKey(), drawId: 1, answers: { "q-eutectoid": { kind: "numeric", value: "727", unit: "degC" } } },
      { idempotencyKey: newKey(), drawId: 1, answers: { "q-single": { kind: "essay", text: "hi" } } },
      { idempotencyKey: "has spaces in it", drawId: 1, answers: {} },
    ];
    for (const body of cases) {
      const res = await submit(s, "fixture-quiz", body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.code).toBe("validation_failed");
    }
    expect(await t.db.read(() => t.db.models.QuizAttempt.count({ where: { userId: s.user.id } }))).toBe(0);
  });

  it("needs a CSRF token and a session", async () => {
    const s = await newStudent(t);
    expect((await s.agent.post("/api/quizzes/fixture-quiz/attempts").send({ idempotencyKey: newKey(), drawId: 1, answers: {} })).status).toBe(403);
    expect((await request(t.app).post("/api/quizzes/fixture-quiz/attempts").send({})).status).toBeGreaterThanOrEqual(401);
  });
});

describe("attempt limits", () => {
  it("N parallel submissions with different keys at a limit of 2 store exactly 2", async () => {
    const s = await newStudent(t);
    await cohortWithLimit(t, moduleId, [s.user], 2);
    const v = await view(s, "fixture-quiz-2");
    expect(v.attempts).toEqual({ used: 0, limit: 2, remaining: 2 });
    const N = 10;
    const results = await Promise.all(
      Array.from({ length: N }, () => submit(s, "fixture-quiz-2", { idempotencyKey: newKey(), drawId: v.drawId, answers: { q1: { kind: "single", choice: "a" } } })),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((x) => x === 201)).toHaveLength(2);
    expect(statuses.filter((x) => x === 409)).toHaveLength(N - 2);
    for (const r of results.filter((x) => x.status === 409)) expect(r.body.error.code).toBe("attempt_limit_reached");
    expect(await t.db.read(() => t.db.models.QuizAttempt.count({ where: { userId: s.user.id, quizId: "fixture-quiz-2" } }))).toBe(2);
    expect((await view(s, "fixture-quiz-2")).attempts).toEqual({ used: 2, limit: 2, remaining: 0 });
    // A retry of a stored attempt still answers after the limit is reached.
    const stored = results.find((r) => r.status === 201)!;
    const retryKey = (await t.db.read(() => t.db.models.QuizAttempt.findByPk(stored.body.id)))!.idempotencyKey;
    const retry = await submit(s, "fixture-quiz-2", { idempotencyKey: retryKey, drawId: 1, answers: {} });
    expect(retry.status).toBe(200);
    expect(retry.body.id).toBe(stored.body.id);
  });

  it("the smallest limit of the student's active cohorts applies; archived cohorts and other modules do not count", async () => {
    const s = await newStudent(t);
    await cohortWithLimit(t, moduleId, [s.user], 4);
    await cohortWithLimit(t, moduleId, [s.user], 3);
    await cohortWithLimit(t, moduleId, [s.user], null);
    await cohortWithLimit(t, moduleId, [s.user], 1, true);
    const other = await t.db.write((transaction) => t.db.models.Module.create({ slug: "elsewhere", title: "Elsewhere", order: 2 }, { transaction }));
    await cohortWithLimit(t, other.id, [s.user], 1);
    expect((await view(s)).attempts.limit).toBe(3);
    const free = await newStudent(t);
    expect((await view(free)).attempts.limit).toBeNull();
  });

  it("parallel submissions of one parameterised draw: only one is graded, the rest must reload", async () => {
    const s = await newStudent(t);
    await cohortWithLimit(t, moduleId, [s.user], 5);
    const v = await view(s);
    const results = await Promise.all(Array.from({ length: 4 }, () => submit(s, "fixture-quiz", { idempotencyKey: newKey(), drawId: v.drawId, answers: rightAnswers(v) })));
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    expect(await t.db.read(() => t.db.models.QuizAttempt.count({ where: { userId: s.user.id } }))).toBe(1);
  });
});

describe("GET /api/quizzes/:id/attempts", () => {
  it("lists the learner's own attempts, newest first, and nobody else's", async () => {
    const a = await newStudent(t);
    const b = await newStudent(t);
    for (const choice of ["b", "a"]) {
      expect((await submit(a, "fixture-quiz-2", { idempotencyKey: newKey(), drawId: 1, answers: { q1: { kind: "single", choice } } })).status).toBe(201);
    }
    const mine = (await a.agent.get("/api/quizzes/fixture-quiz-2/attempts")).body as AttemptHistory;
    expect(mine.attempts.map((x) => x.score)).toEqual([1, 0]);
    expect(mine.attempts[1].results[0]).toMatchObject({ correct: false, given: "At least 18 %", correctAnswer: "At least 10.5 %" });
    expect(mine.allowance.used).toBe(2);
    const theirs = (await b.agent.get("/api/quizzes/fixture-quiz-2/attempts")).body as AttemptHistory;
    expect(theirs.attempts).toEqual([]);
    expect((await request(t.app).get("/api/quizzes/fixture-quiz-2/attempts")).status).toBe(401);
  });
});

it("presentQuiz keeps every question and hides every key (pure check over many seeds)", () => {
  for (const seed of [1, 2, 3, 99, 2024]) {
    const json = JSON.stringify(presentQuiz(fixtureQuiz, seed));
    expect(json).not.toMatch(/SECRET|answer|explanation|feedback/);
  }
});
