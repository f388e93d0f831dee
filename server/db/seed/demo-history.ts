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

const ICH1 = "iron-carbon-hardness-1";
const ICH2 = "iron-carbon-hardness-2";
const WS1 = "why-stainless-1";
const WS2 = "why-stainless-2";
const MI1 = "melt-to-ingot-1";

/** A lesson read to the end: opened, and every section reached, so many days ago. */
const finished = (lesson: string, openedDaysAgo: number, completedDaysAgo: number): LessonPlan => ({ lesson, openedDaysAgo, completedDaysAgo });
/** A lesson still in progress, with the share of its sections reached (0..1). */
const reading = (lesson: string, openedDaysAgo: number, reached: number): LessonPlan => ({ lesson, openedDaysAgo, reached });
/** A quiz attempt with `wrong` answers wrong and `blank` left out. */
const attempt = (quiz: string, daysAgo: number, wrong: number, blank?: number): AttemptPlan => ({ quiz, daysAgo, wrong, ...(blank ? { blank } : {}) });

export const STUDENT_STORIES: StudentStory[] = [
  // Autumn Forge Cohort (Hale Emberton) --------------------------------------------------------
  {
    local: "mara.quillon", // steady and on time, now into module 2
    skill: 0.9,
    lessons: [finished(IC, 14, 12), finished(HT, 11, 9), finished(PF, 3, 2)],
    attempts: [attempt(ICH1, 11.6, 1), attempt(ICH2, 8.8, 0), attempt(WS1, 1.8, 1)],
  },
  {
    local: "tobin.ashgrove", // finished module 1 late: failed first, passed after the due date
    skill: 0.6,
    lessons: [finished(IC, 10, 7), finished(HT, 6, 1.5)],
    attempts: [attempt(ICH1, 6.5, 3), attempt(ICH1, 1.2, 1), attempt(ICH2, 0.9, 2)],
  },
  {
    local: "ines.forthwell", // struggling: all three attempts at quiz 1 used, none passed
    skill: 0.4,
    lessons: [finished(IC, 12, 8), reading(HT, 5, 0.4)],
    attempts: [attempt(ICH1, 8, 4), attempt(ICH1, 6, 3), attempt(ICH1, 4.2, 3)],
  },
  {
    local: "dario.penhallow", // passed quiz 1, second lesson unfinished: overdue
    skill: 0.7,
    lessons: [finished(IC, 9, 6), reading(HT, 4, 0.6)],
    attempts: [attempt(ICH1, 5.5, 2)],
  },
  {
    local: "wren.ostby", // ahead of the class: module 2 finished early, module 3 opened
    skill: 0.95,
    lessons: [finished(IC, 15, 13), finished(HT, 12, 10), finished(PF, 7, 6), finished(CP, 5, 3), reading(CA, 1, 0.3)],
    attempts: [attempt(ICH1, 12.5, 0), attempt(ICH2, 9.5, 1), attempt(WS1, 5.5, 1), attempt(WS2, 2.6, 3), attempt(WS2, 2.4, 1)],
  },
  {
    local: "kofi.brannagh", // opened the first lesson once, two weeks ago
    skill: 0.5,
    lessons: [reading(IC, 13, 0.15)],
    attempts: [],
  },
  {
    local: "lumi.harrowgate", // in both cohorts; passed on the second try, on time
    skill: 0.75,
    lessons: [finished(IC, 11, 9), finished(HT, 8, 5)],
    attempts: [attempt(ICH1, 8.7, 3), attempt(ICH1, 7.9, 1), attempt(ICH2, 4.6, 2)],
  },
  {
    local: "ezra.coldwater", // in both cohorts; one failed attempt, lesson half read: overdue
    skill: 0.5,
    lessons: [reading(IC, 6, 0.5)],
    attempts: [attempt(ICH1, 2.5, 3, 1)],
  },
  {
    local: "yusra.delacombe", // on time; failed the first quiz of module 2 yesterday
    skill: 0.85,
    lessons: [finished(IC, 13, 11), finished(HT, 10, 7), reading(PF, 2, 0.5)],
    attempts: [attempt(ICH1, 10.2, 0), attempt(ICH2, 6.6, 1), attempt(WS1, 0.6, 3)],
  },
  {
    local: "femi.hartigan", // started late and finished module 1 a few hours ago
    skill: 0.7,
    lessons: [finished(IC, 8, 2), finished(HT, 2, 0.4)],
    attempts: [attempt(ICH1, 1.6, 2), attempt(ICH2, 0.3, 1)],
  },
  {
    local: "saoirse.blackmore", // reads the lessons, has not tried a quiz yet
    skill: 0.8,
    lessons: [finished(IC, 7, 5), reading(HT, 4, 0.7)],
    attempts: [],
  },
  {
    local: "matteo.greaves", // passed quiz 1, failed quiz 2 before the due date
    skill: 0.65,
    lessons: [finished(IC, 9, 8), finished(HT, 6, 5)],
    attempts: [attempt(ICH1, 7.3, 1), attempt(ICH2, 4.1, 3, 1)],
  },
  // Weekend Bladesmiths (Sefa Cardell) only ----------------------------------------------------
  {
    local: "priya.tallisker",
    skill: 0.8,
    lessons: [finished(IC, 5, 4)],
    attempts: [attempt(ICH1, 3.5, 1)],
  },
  {
    local: "jonas.villemont",
    skill: 0.55,
    lessons: [reading(IC, 3, 0.5)],
    attempts: [attempt(ICH1, 1.1, 3)],
  },
  {
    local: "anouk.stennet",
    skill: 0.8,
    lessons: [finished(FS, 2, 1)],
    attempts: [attempt(MI1, 0.8, 2)],
  },
];
