import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";
import type { Models } from "./index";

/**
 * A photo or PDF attached to a notebook entry. The bytes live on disk in the uploads directory
 * under `storedName` (and `thumbName`), both chosen by the server; `userId` is the entry's owner,
 * whose quota the sizes count against.
 */
export interface NotebookFileInstance extends Model<InferAttributes<NotebookFileInstance>, InferCreationAttributes<NotebookFileInstance>> {
  id: CreationOptional<number>;
  entryId: number;
  userId: number;
  kind: "image" | "pdf";
  mimeType: string;
  storedName: string;
  thumbName: string | null;
  originalName: string;
  sizeBytes: number;
  thumbBytes: number;
  width: number | null;
  height: number | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const notebookFileModel: ModelEntry<NotebookFileInstance> = {
  define: (sequelize) =>
    sequelize.define<NotebookFileInstance>(
      "NotebookFile",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(8), allowNull: false, validate: { isIn: [["image", "pdf"]] } },
        mimeType: { type: DataTypes.STRING(40), allowNull: false },
        storedName: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        thumbName: { type: DataTypes.STRING(64), allowNull: true, unique: true },
        originalName: { type: DataTypes.STRING(120), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        thumbBytes: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        width: { type: DataTypes.INTEGER, allowNull: true },
        height: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "NotebookFiles" },
    ),
  associate: (m: Models) => {
    m.NotebookFile.belongsTo(m.NotebookEntry, { foreignKey: "entryId", as: "entry" });
  },
};
