import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
  type NonAttribute,
  type Sequelize,
} from "sequelize";
import type { Models } from "./index";
import type { SavedAlloyInstance } from "./saved-alloy";
import type { UserInstance } from "./user";

/**
 * A saved alloy an instructor attached to a lesson task, with a note for the learners.
 * UNIQUE(alloyId, lessonSlug): attaching again updates the note. Deleting the alloy removes it.
 */
export interface LessonAlloyInstance extends Model<InferAttributes<LessonAlloyInstance>, InferCreationAttributes<LessonAlloyInstance>> {
  id: CreationOptional<number>;
  alloyId: number;
  lessonSlug: string;
  note: CreationOptional<string>;
  attachedById: number;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  alloy?: NonAttribute<SavedAlloyInstance>;
  attachedBy?: NonAttribute<UserInstance>;
}

export const lessonAlloyModel = {
  define: (sequelize: Sequelize) =>
    sequelize.define<LessonAlloyInstance>(
      "LessonAlloy",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        alloyId: { type: DataTypes.INTEGER, allowNull: false },
        lessonSlug: { type: DataTypes.STRING(120), allowNull: false },
        note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: "" },
        attachedById: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "LessonAlloys", indexes: [{ unique: true, fields: ["alloyId", "lessonSlug"] }] },
    ),
  associate: (m: Models) => {
    m.LessonAlloy.belongsTo(m.SavedAlloy, { foreignKey: "alloyId", as: "alloy" });
    m.LessonAlloy.belongsTo(m.User, { foreignKey: "attachedById", as: "attachedBy" });
  },
};
