import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/**
 * A submitted quiz attempt. The client sends an idempotency key; UNIQUE(userId, idempotencyKey)
 * makes a retried submit (e.g. after a lost response) return the stored attempt, never a duplicate.
 */
export interface QuizAttemptInstance
  extends Model<InferAttributes<QuizAttemptInstance>, InferCreationAttributes<QuizAttemptInstance>> {
  id: CreationOptional<number>;
  userId: number;
  quizId: string;
  idempotencyKey: string;
  answers: unknown;
  score: number;
  maxScore: number;
  /** Per-question grading detail. */
  graded: unknown;
  submittedAt: Date;
  /** Seed used to generate/shuffle the questions, so the attempt can be replayed. */
  seed: number;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const quizAttemptModel: ModelEntry<QuizAttemptInstance> = {
  define: (sequelize) =>
    sequelize.define<QuizAttemptInstance>(
      "QuizAttempt",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        quizId: { type: DataTypes.STRING(120), allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(64), allowNull: false },
        answers: { type: DataTypes.JSON, allowNull: false },
        score: { type: DataTypes.FLOAT, allowNull: false },
        maxScore: { type: DataTypes.FLOAT, allowNull: false },
        graded: { type: DataTypes.JSON, allowNull: false },
        submittedAt: { type: DataTypes.DATE, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        tableName: "QuizAttempts",
        indexes: [{ unique: true, fields: ["userId", "idempotencyKey"] }, { fields: ["userId", "quizId"] }],
      },
    ),
};
