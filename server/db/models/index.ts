import type { Model, Sequelize } from "sequelize";
import type { ModelEntry } from "./entry";
import { assignmentModel } from "./assignment";
import { auditLogModel } from "./audit-log";
import { cohortModel } from "./cohort";
import { enrollmentModel } from "./enrollment";
import { lessonProgressModel } from "./lesson-progress";
import { moduleModel } from "./module";
import { quizAttemptModel } from "./quiz-attempt";
import { sessionModel } from "./session";
import { userModel } from "./user";
import { savedAlloyModel } from "./saved-alloy";
import { lessonAlloyModel } from "./lesson-alloy";
import { invitationModel } from "./invitation";
import { outboxMessageModel } from "./outbox-message";
import { reminderLogModel } from "./reminder-log";
import { notebookEntryModel } from "./notebook-entry";
import { notebookFileModel } from "./notebook-file";
import { notebookCommentModel } from "./notebook-comment";
import { studyPassModel } from "./study-pass";
import { billingEventModel } from "./billing-event";

/**
 * Model registry. Models are defined per Sequelize instance (not with global `Model.init`), so
 * tests can run several isolated apps in one process.
 *
 * HOW TO ADD A MODEL
 *   1. Create `server/db/models/<name>.ts` exporting `const <name>Model: ModelEntry<Instance> = { define, associate? }`
 *      (the `ModelEntry` annotation is optional but gives better errors)
 *      (copy module.ts; `define` returns `sequelize.define<Instance>("Name", attributes, { tableName })`).
 *   2. Add ONE line to REGISTRY below.
 *   3. Create the table in a new migration (see ../migrations/index.ts). Never use sync().
 */
const REGISTRY = {
  User: userModel,
  Cohort: cohortModel,
  Enrollment: enrollmentModel,
  Module: moduleModel,
  Assignment: assignmentModel,
  LessonProgress: lessonProgressModel,
  QuizAttempt: quizAttemptModel,
  AuditLog: auditLogModel,
  Session: sessionModel,
  SavedAlloy: savedAlloyModel,
  LessonAlloy: lessonAlloyModel,
  Invitation: invitationModel,
  OutboxMessage: outboxMessageModel,
  ReminderLog: reminderLogModel,
  NotebookEntry: notebookEntryModel,
  NotebookFile: notebookFileModel,
  NotebookComment: notebookCommentModel,
  StudyPass: studyPassModel,
  BillingEvent: billingEventModel,
};

type Registry = typeof REGISTRY;
type ModelsOf<R> = { [K in keyof R]: R[K] extends { define(sequelize: Sequelize): infer S } ? S : never };
/**
 * The defined models, by name. An interface (not a type alias) on purpose: model files refer to
 * it in `associate(m: Models)`, and interfaces are resolved lazily, so that reference does not
 * make each entry's type depend on itself.
 */
export interface Models extends ModelsOf<Registry> {}

export function defineModels(sequelize: Sequelize): Models {
  const entries = Object.entries(REGISTRY) as [string, ModelEntry<Model>][];
  const models = Object.fromEntries(entries.map(([name, entry]) => [name, entry.define(sequelize)])) as unknown as Models;
  for (const [, entry] of entries) entry.associate?.(models);
  return models;
}

export type { AssignmentInstance } from "./assignment";
export type { AuditLogInstance } from "./audit-log";
export type { CohortInstance } from "./cohort";
export type { EnrollmentInstance } from "./enrollment";
export type { LessonProgressInstance } from "./lesson-progress";
export type { ModuleInstance } from "./module";
export type { QuizAttemptInstance } from "./quiz-attempt";
export type { SessionInstance } from "./session";
export type { UserInstance } from "./user";
export type { SavedAlloyInstance } from "./saved-alloy";
export type { LessonAlloyInstance } from "./lesson-alloy";
export type { InvitationInstance } from "./invitation";
export type { OutboxMessageInstance } from "./outbox-message";
export type { ReminderLogInstance } from "./reminder-log";
export type { StudyPassInstance } from "./study-pass";
export type { BillingEventInstance } from "./billing-event";
