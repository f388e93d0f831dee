import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
  type NonAttribute,
} from "sequelize";
import type { ColdTreatment, HardnessReading, QuenchMedium, ReviewStatus } from "../../../shared/api/notebook";
import type { ModelEntry } from "./entry";
import type { Models } from "./index";
import type { NotebookCommentInstance } from "./notebook-comment";
import type { NotebookFileInstance } from "./notebook-file";
import type { UserInstance } from "./user";

/** One forge-notebook entry, owned by `userId` (validated by shared/api/notebook.ts before writing). */
export interface NotebookEntryInstance
  extends Model<InferAttributes<NotebookEntryInstance>, InferCreationAttributes<NotebookEntryInstance>> {
  id: CreationOptional<number>;
  userId: number;
  title: string;
  /** YYYY-MM-DD */
  workedOn: string;
  steelKey: string;
  steelLabel: string;
  composition: Record<string, number>;
  comparisonKey: string;
  normalizingCycles: number;
  austenitizeC: number;
  soakMinutes: number;
  quenchMedium: QuenchMedium;
  coldTreatment: ColdTreatment;
  temperCycles: number;
  temperC: number | null;
  temperHours: number | null;
  hardness: HardnessReading[];
  notes: string;
  reviewStatus: CreationOptional<ReviewStatus>;
  reviewedAt: CreationOptional<Date | null>;
  reviewedById: CreationOptional<number | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  owner?: NonAttribute<UserInstance>;
  reviewer?: NonAttribute<UserInstance | null>;
  files?: NonAttribute<NotebookFileInstance[]>;
  comments?: NonAttribute<NotebookCommentInstance[]>;
}

export const notebookEntryModel: ModelEntry<NotebookEntryInstance> = {
  define: (sequelize) =>
    sequelize.define<NotebookEntryInstance>(
      "NotebookEntry",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        workedOn: { type: DataTypes.DATEONLY, allowNull: false },
        steelKey: { type: DataTypes.STRING(40), allowNull: false },
        steelLabel: { type: DataTypes.STRING(80), allowNull: false },
        composition: { type: DataTypes.JSON, allowNull: false },
        comparisonKey: { type: DataTypes.STRING(200), allowNull: false },
        normalizingCycles: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        austenitizeC: { type: DataTypes.FLOAT, allowNull: false },
        soakMinutes: { type: DataTypes.FLOAT, allowNull: false },
        quenchMedium: { type: DataTypes.STRING(20), allowNull: false },
        coldTreatment: { type: DataTypes.STRING(20), allowNull: false, defaultValue: "none" },
        temperCycles: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        temperC: { type: DataTypes.FLOAT, allowNull: true },
        temperHours: { type: DataTypes.FLOAT, allowNull: true },
        hardness: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        reviewStatus: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "unreviewed" },
        reviewedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        reviewedById: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "NotebookEntries" },
    ),
  associate: (m: Models) => {
    m.NotebookEntry.belongsTo(m.User, { foreignKey: "userId", as: "owner" });
    m.NotebookEntry.belongsTo(m.User, { foreignKey: "reviewedById", as: "reviewer" });
    m.NotebookEntry.hasMany(m.NotebookFile, { foreignKey: "entryId", as: "files" });
    m.NotebookEntry.hasMany(m.NotebookComment, { foreignKey: "entryId", as: "comments" });
  },
};
