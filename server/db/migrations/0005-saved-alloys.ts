import { DataTypes } from "sequelize";
import type { Migration } from "./types";

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};
const fk = (table: string) => ({
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: table, key: "id" },
  onDelete: "CASCADE",
  onUpdate: "CASCADE",
});

/** Saved alloys per user (alloy explorer) and alloys attached to lesson tasks by instructors. */
export const savedAlloys: Migration = {
  name: "0005-saved-alloys",
  async up({ queryInterface: qi, transaction }) {
    await qi.createTable(
      "SavedAlloys",
      {
        id,
        userId: fk("Users"),
        name: { type: DataTypes.STRING(60), allowNull: false },
        composition: { type: DataTypes.JSON, allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("SavedAlloys", ["userId"], { transaction });

    await qi.createTable(
      "LessonAlloys",
      {
        id,
        alloyId: fk("SavedAlloys"),
        lessonSlug: { type: DataTypes.STRING(120), allowNull: false },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        attachedById: fk("Users"),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("LessonAlloys", ["alloyId", "lessonSlug"], { unique: true, transaction });
    await qi.addIndex("LessonAlloys", ["lessonSlug"], { transaction });
  },
  async down({ queryInterface: qi, transaction }) {
    await qi.dropTable("LessonAlloys", { transaction });
    await qi.dropTable("SavedAlloys", { transaction });
  },
};
