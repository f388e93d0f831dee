import { DataTypes } from "sequelize";
import type { Migration } from "./types";

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};
const fk = (table: string, onDelete: "CASCADE" | "SET NULL" = "CASCADE", allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: "id" },
  onDelete,
  onUpdate: "CASCADE",
});

/**
 * Forge notebook: entries (one blade or coupon with its steel, heat treatment and hardness
 * readings), their uploaded files (stored on disk under server-chosen names; the rows hold the
 * names and sizes for the per-user quota) and instructors' review comments.
 */
export const notebook: Migration = {
  name: "0040-notebook",
  async up({ queryInterface: qi, transaction }) {
    await qi.createTable(
      "NotebookEntries",
      {
        id,
        userId: fk("Users"),
        title: { type: DataTypes.STRING(120), allowNull: false },
        workedOn: { type: DataTypes.DATEONLY, allowNull: false },
        steelKey: { type: DataTypes.STRING(40), allowNull: false },
        steelLabel: { type: DataTypes.STRING(80), allowNull: false },
        composition: { type: DataTypes.JSON, allowNull: false },
        /** "grade:<id>" or "comp:<canonical composition>": entries of the same steel share it (cohort chart). */
        comparisonKey: { type: DataTypes.STRING(200), allowNull: false },
        normalizingCycles: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        austenitizeC: { type: DataTypes.FLOAT, allowNull: false },
        soakMinutes: { type: DataTypes.FLOAT, allowNull: false },
        quenchMedium: { type: DataTypes.STRING(20), allowNull: false },
        coldTreatment: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "none" },
        temperCycles: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        temperC: { type: DataTypes.FLOAT, allowNull: true },
        temperHours: { type: DataTypes.FLOAT, allowNull: true },
        hardness: { type: DataTypes.JSON, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        reviewStatus: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "unreviewed" },
        reviewedAt: { type: DataTypes.DATE, allowNull: true },
        reviewedById: fk("Users", "SET NULL", true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("NotebookEntries", ["userId", "workedOn"], { transaction });
    await qi.addIndex("NotebookEntries", ["comparisonKey"], { transaction });
    await qi.addIndex("NotebookEntries", ["reviewStatus"], { transaction });

    await qi.createTable(
      "NotebookFiles",
      {
        id,
        entryId: fk("NotebookEntries"),
        userId: fk("Users"),
        kind: { type: DataTypes.STRING(8), allowNull: false },
        mimeType: { type: DataTypes.STRING(40), allowNull: false },
        storedName: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        thumbName: { type: DataTypes.STRING(64), allowNull: true, unique: true },
        originalName: { type: DataTypes.STRING(120), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        thumbBytes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        width: { type: DataTypes.INTEGER, allowNull: true },
        height: { type: DataTypes.INTEGER, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("NotebookFiles", ["entryId"], { transaction });
    await qi.addIndex("NotebookFiles", ["userId"], { transaction });

    await qi.createTable(
      "NotebookComments",
      {
        id,
        entryId: fk("NotebookEntries"),
        authorId: fk("Users"),
        body: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        status: { type: DataTypes.STRING(16), allowNull: true },
        notification: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "none" },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("NotebookComments", ["entryId"], { transaction });
  },
  async down({ queryInterface: qi, transaction }) {
    await qi.dropTable("NotebookComments", { transaction });
    await qi.dropTable("NotebookFiles", { transaction });
    await qi.dropTable("NotebookEntries", { transaction });
  },
};
