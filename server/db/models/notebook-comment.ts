import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
  type NonAttribute,
} from "sequelize";
import type { ModelEntry } from "./entry";
import type { Models } from "./index";
import type { UserInstance } from "./user";

/** An instructor's comment on a notebook entry, optionally setting its review status; the student is e-mailed. */
export interface NotebookCommentInstance
  extends Model<InferAttributes<NotebookCommentInstance>, InferCreationAttributes<NotebookCommentInstance>> {
  id: CreationOptional<number>;
  entryId: number;
  authorId: number;
  body: string;
  status: "reviewed" | "needs-rework" | null;
  /** The student's e-mail: "pending" until sent, then "sent" or "failed"; "none" when no mail was due. */
  notification: CreationOptional<"none" | "pending" | "sent" | "failed">;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  author?: NonAttribute<UserInstance>;
}

export const notebookCommentModel: ModelEntry<NotebookCommentInstance> = {
  define: (sequelize) =>
    sequelize.define<NotebookCommentInstance>(
      "NotebookComment",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        entryId: { type: DataTypes.INTEGER, allowNull: false },
        authorId: { type: DataTypes.INTEGER, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
        status: { type: DataTypes.STRING(16), allowNull: true },
        notification: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "none" },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "NotebookComments" },
    ),
  associate: (m: Models) => {
    m.NotebookComment.belongsTo(m.User, { foreignKey: "authorId", as: "author" });
  },
};
