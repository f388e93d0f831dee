/**
 * What each demo student has done, in days before "now" (fractions are hours). The plans only
 * say WHEN and HOW MANY answers go wrong; the lesson service merges the progress and the quiz
 * grader decides every score. Module 1 ("iron-carbon-hardness") is due 3 days ago in the Autumn
 * cohort with at most 3 attempts per quiz, so the stories cover: on time, finished late,
 * attempts used up, still overdue, ahead of the class, and not started.
 * The demo student (student@grain-edge.test) has no story: their state is fixed in demo-school.ts.
 */

export interface LessonPlan {
  lesson: string;
  openedDaysAgo: number;
  /** When every section was reached; omit for a lesson still in progress. */
  completedDaysAgo?: number;
  /** For a lesson in progress: the share of its sections reached (0..1). */
  reached?: number;
}

export interface AttemptPlan {
  quiz: string;
  daysAgo: number;
  /** Questions answered wrongly (chosen with the student's seeded random). */
  wrong: number;
  /** Questions left blank, besides the wrong ones. */
  blank?: number;
}

export interface StudentStory {
  local: string;
  /** Chance that an in-lesson check question is answered right. */
  skill: number;
  lessons: LessonPlan[];
  attempts: AttemptPlan[];
}

const IC = "iron-and-carbon";
const HT = "hardening-and-tempering";
const PF = "the-passive-film";
const CP = "carbon-chromium-and-pitting";
const CA = "carbides-and-abrasives";
const FS = "freezing-and-segregation";

export const STUDENT_STORIES: StudentStory[] = [
  // Autumn Forge Cohort (Hale Emberton) --------------------------------------------------------
  {
    local: "mara.quillon", // steady and on time, now into module 2
    skill: 0.9,
    lessons: [
      { lesson: IC, openedDaysAgo: 14, completedDaysAgo: 12 },
      { lesson: HT, openedDaysAgo: 11, completedDaysAgo: 9 },
      { lesson: PF, openedDaysAgo: 3, completedDaysAgo: 2 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 11.6, wrong: 1 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 8.8, wrong: 0 },
      { quiz: "why-stainless-1", daysAgo: 1.8, wrong: 1 },
    ],
  },
  {
    local: "tobin.ashgrove", // finished module 1 late: failed first, passed after the due date
    skill: 0.6,
    lessons: [
      { lesson: IC, openedDaysAgo: 10, completedDaysAgo: 7 },
      { lesson: HT, openedDaysAgo: 6, completedDaysAgo: 1.5 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 6.5, wrong: 3 },
      { quiz: "iron-carbon-hardness-1", daysAgo: 1.2, wrong: 1 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 0.9, wrong: 2 },
    ],
  },
  {
    local: "ines.forthwell", // struggling: all three attempts at quiz 1 used, none passed
    skill: 0.4,
    lessons: [
      { lesson: IC, openedDaysAgo: 12, completedDaysAgo: 8 },
      { lesson: HT, openedDaysAgo: 5, reached: 0.4 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 8, wrong: 4 },
      { quiz: "iron-carbon-hardness-1", daysAgo: 6, wrong: 3 },
      { quiz: "iron-carbon-hardness-1", daysAgo: 4.2, wrong: 3 },
    ],
  },
  {
    local: "dario.penhallow", // passed quiz 1, second lesson unfinished: overdue
    skill: 0.7,
    lessons: [
      { lesson: IC, openedDaysAgo: 9, completedDaysAgo: 6 },
      { lesson: HT, openedDaysAgo: 4, reached: 0.6 },
    ],
    attempts: [{ quiz: "iron-carbon-hardness-1", daysAgo: 5.5, wrong: 2 }],
  },
  {
    local: "wren.ostby", // ahead of the class: module 2 finished early, module 3 opened
    skill: 0.95,
    lessons: [
      { lesson: IC, openedDaysAgo: 15, completedDaysAgo: 13 },
      { lesson: HT, openedDaysAgo: 12, completedDaysAgo: 10 },
      { lesson: PF, openedDaysAgo: 7, completedDaysAgo: 6 },
      { lesson: CP, openedDaysAgo: 5, completedDaysAgo: 3 },
      { lesson: CA, openedDaysAgo: 1, reached: 0.3 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 12.5, wrong: 0 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 9.5, wrong: 1 },
      { quiz: "why-stainless-1", daysAgo: 5.5, wrong: 1 },
      { quiz: "why-stainless-2", daysAgo: 2.6, wrong: 3 },
      { quiz: "why-stainless-2", daysAgo: 2.4, wrong: 1 },
    ],
  },
  {
    local: "kofi.brannagh", // opened the first lesson once, two weeks ago
    skill: 0.5,
    lessons: [{ lesson: IC, openedDaysAgo: 13, reached: 0.15 }],
    attempts: [],
  },
  {
    local: "lumi.harrowgate", // in both cohorts; passed on the second try, on time
    skill: 0.75,
    lessons: [
      { lesson: IC, openedDaysAgo: 11, completedDaysAgo: 9 },
      { lesson: HT, openedDaysAgo: 8, completedDaysAgo: 5 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 8.7, wrong: 3 },
      { quiz: "iron-carbon-hardness-1", daysAgo: 7.9, wrong: 1 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 4.6, wrong: 2 },
    ],
  },
  {
    local: "ezra.coldwater", // in both cohorts; one failed attempt, lesson half read: overdue
    skill: 0.5,
    lessons: [{ lesson: IC, openedDaysAgo: 6, reached: 0.5 }],
    attempts: [{ quiz: "iron-carbon-hardness-1", daysAgo: 2.5, wrong: 3, blank: 1 }],
  },
  {
    local: "yusra.delacombe", // on time; failed the first quiz of module 2 yesterday
    skill: 0.85,
    lessons: [
      { lesson: IC, openedDaysAgo: 13, completedDaysAgo: 11 },
      { lesson: HT, openedDaysAgo: 10, completedDaysAgo: 7 },
      { lesson: PF, openedDaysAgo: 2, reached: 0.5 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 10.2, wrong: 0 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 6.6, wrong: 1 },
      { quiz: "why-stainless-1", daysAgo: 0.6, wrong: 3 },
    ],
  },
  {
    local: "femi.hartigan", // started late and finished module 1 a few hours ago
    skill: 0.7,
    lessons: [
      { lesson: IC, openedDaysAgo: 8, completedDaysAgo: 2 },
      { lesson: HT, openedDaysAgo: 2, completedDaysAgo: 0.4 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 1.6, wrong: 2 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 0.3, wrong: 1 },
    ],
  },
  {
    local: "saoirse.blackmore", // reads the lessons, has not tried a quiz yet
    skill: 0.8,
    lessons: [
      { lesson: IC, openedDaysAgo: 7, completedDaysAgo: 5 },
      { lesson: HT, openedDaysAgo: 4, reached: 0.7 },
    ],
    attempts: [],
  },
  {
    local: "matteo.greaves", // passed quiz 1, failed quiz 2 before the due date
    skill: 0.65,
    lessons: [
      { lesson: IC, openedDaysAgo: 9, completedDaysAgo: 8 },
      { lesson: HT, openedDaysAgo: 6, completedDaysAgo: 5 },
    ],
    attempts: [
      { quiz: "iron-carbon-hardness-1", daysAgo: 7.3, wrong: 1 },
      { quiz: "iron-carbon-hardness-2", daysAgo: 4.1, wrong: 3, blank: 1 },
    ],
  },
  // Weekend Bladesmiths (Sefa Cardell) only ----------------------------------------------------
  {
    local: "priya.tallisker",
    skill: 0.8,
    lessons: [{ lesson: IC, openedDaysAgo: 5, completedDaysAgo: 4 }],
    attempts: [{ quiz: "iron-carbon-hardness-1", daysAgo: 3.5, wrong: 1 }],
  },
  {
    local: "jonas.villemont",
    skill: 0.55,
    lessons: [{ lesson: IC, openedDaysAgo: 3, reached: 0.5 }],
    attempts: [{ quiz: "iron-carbon-hardness-1", daysAgo: 1.1, wrong: 3 }],
  },
  {
    local: "anouk.stennet",
    skill: 0.8,
    lessons: [{ lesson: FS, openedDaysAgo: 2, completedDaysAgo: 1 }],
    attempts: [{ quiz: "melt-to-ingot-1", daysAgo: 0.8, wrong: 2 }],
  },
];
