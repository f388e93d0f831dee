import type { Role } from "../../../shared/api/auth";

/**
 * The people of the demo school. Every one of them is INVENTED, and every demo account uses
 * DEMO_PASSWORD (printed in the README), so the demo must never run on a server others can reach.
 */
export const DEMO_PASSWORD = "forge-demo-1";
export const DEMO_SCHOOL = "Cinderfield Forge School";

export interface DemoPerson {
  email: string;
  displayName: string;
  role: Role;
}

export const DEMO_ADMIN: DemoPerson = { email: "admin@grain-edge.test", displayName: "Odile Varrick", role: "admin" };
export const DEMO_INSTRUCTORS: DemoPerson[] = [
  { email: "instructor@grain-edge.test", displayName: "Hale Emberton", role: "instructor" },
  { email: "instructor2@grain-edge.test", displayName: "Sefa Cardell", role: "instructor" },
];
export const DEMO_STUDENT: DemoPerson = { email: "student@grain-edge.test", displayName: "Ruth Kettleby", role: "student" };

// Order matters: user ids follow it, and tests name students by index (0 and 1 are Autumn students).
const OTHER_STUDENTS: [string, string][] = [
  ["mara.quillon", "Mara Quillon"],
  ["tobin.ashgrove", "Tobin Ashgrove"],
  ["ines.forthwell", "Ines Forthwell"],
  ["dario.penhallow", "Dario Penhallow"],
  ["wren.ostby", "Wren Ostby"],
  ["kofi.brannagh", "Kofi Brannagh"],
  ["lumi.harrowgate", "Lumi Harrowgate"],
  ["ezra.coldwater", "Ezra Coldwater"],
  ["priya.tallisker", "Priya Tallisker"],
  ["jonas.villemont", "Jonas Villemont"],
  ["anouk.stennet", "Anouk Stennet"],
  ["caleb.morrow-finch", "Caleb Morrow-Finch"],
  // Added later so the demo instructor's cohort has a full bench; appended to keep earlier ids.
  ["yusra.delacombe", "Yusra Delacombe"],
  ["femi.hartigan", "Femi Hartigan"],
  ["saoirse.blackmore", "Saoirse Blackmore"],
  ["matteo.greaves", "Matteo Greaves"],
];
export const DEMO_OTHER_STUDENTS: DemoPerson[] = OTHER_STUDENTS.map(([local, displayName]) => ({
  email: `${local}@grain-edge.test`,
  displayName,
  role: "student",
}));

/** The demo instructor's cohort: the demo student, the first eight others and the four added later. */
export const DEMO_AUTUMN_STUDENTS: DemoPerson[] = [DEMO_STUDENT, ...DEMO_OTHER_STUDENTS.slice(0, 8), ...DEMO_OTHER_STUDENTS.slice(12, 16)];
/** The second instructor's cohort, overlapping the first in the demo student and two others. */
export const DEMO_WEEKEND_STUDENTS: DemoPerson[] = [DEMO_STUDENT, ...DEMO_OTHER_STUDENTS.slice(6, 12)];

export const DEMO_PEOPLE: DemoPerson[] = [DEMO_ADMIN, ...DEMO_INSTRUCTORS, DEMO_STUDENT, ...DEMO_OTHER_STUDENTS];
