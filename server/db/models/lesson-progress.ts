import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/** One row per (user, lesson); UNIQUE(userId, lessonSlug). Lesson slugs refer to content/ files. */
export interface LessonProgressInstance
  extends Model<InferAttributes<LessonProgressInstance>, InferCreationAttributes<LessonProgressInstance>> {
  id: CreationOptional<number>;
  userId: number;
  lessonSlug: string;
  openedAt: Date;
  /** Section ids the reader has scrolled to. */
  sectionsReached: CreationOptional<string[]>;
  /** Inline check id -> answer given. */
  checksAnswered: CreationOptional<Record<string, unknown>>;
  completedAt: CreationOptional<Date | null>;
  lastSection: CreationOptional<string | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const lessonProgressModel: ModelEntry<LessonProgressInstance> = {
  define: (sequelize) =>
    sequelize.define<LessonProgressInstance>(
      "LessonProgress",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        lessonSlug: { type: DataTypes.STRING(120), allowNull: false },
        openedAt: { type: DataTypes.DATE, allowNull: false },
        sectionsReached: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        checksAnswered: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        completedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        lastSection: { type: DataTypes.STRING(120), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "LessonProgress", indexes: [{ unique: true, fields: ["userId", "lessonSlug"] }] },
    ),
};
