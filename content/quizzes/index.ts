/**
 * Every quiz of the course by id (= file name = the `quiz` field of a lesson's frontmatter).
 * Server-only: answer keys live in these definitions.
 */
import type { QuizDefinition } from "../../shared/quiz/definition";
import ironCarbonHardness1 from "./iron-carbon-hardness-1";
import ironCarbonHardness2 from "./iron-carbon-hardness-2";
import whyStainless1 from "./why-stainless-1";
import whyStainless2 from "./why-stainless-2";
import carbidesAndTheEdge1 from "./carbides-and-the-edge-1";
import carbidesAndTheEdge2 from "./carbides-and-the-edge-2";
import meltToIngot1 from "./melt-to-ingot-1";
import powderRoute1 from "./powder-route-1";
import choosingAndTreating1 from "./choosing-and-treating-1";

const ALL: QuizDefinition[] = [
  ironCarbonHardness1,
  ironCarbonHardness2,
  whyStainless1,
  whyStainless2,
  carbidesAndTheEdge1,
  carbidesAndTheEdge2,
  meltToIngot1,
  powderRoute1,
  choosingAndTreating1,
];

export const QUIZZES: Record<string, QuizDefinition> = Object.fromEntries(ALL.map((quiz) => [quiz.id, quiz]));
