import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
  type Sequelize,
} from "sequelize";
import type { AlloyComposition } from "../../../shared/api/alloys";
import type { Models } from "./index";

/** A named composition a user saved from the alloy explorer; owned by `userId`. */
export interface SavedAlloyInstance extends Model<InferAttributes<SavedAlloyInstance>, InferCreationAttributes<SavedAlloyInstance>> {
  id: CreationOptional<number>;
  userId: number;
  name: string;
  /** Mass % of C, Cr, V, W, Mo, Mn, Si, Ni, N (validated by shared/api/alloys.ts before writing). */
  composition: AlloyComposition;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const savedAlloyModel = {
  define: (sequelize: Sequelize) =>
    sequelize.define<SavedAlloyInstance>(
      "SavedAlloy",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(60), allowNull: false },
        composition: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "SavedAlloys" },
    ),
  associate: (m: Models) => {
    m.SavedAlloy.belongsTo(m.User, { foreignKey: "userId", as: "owner" });
  },
};
