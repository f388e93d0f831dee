import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";
import type { Models } from "./index";

export type StudyPassStatus = "pending" | "succeeded";

/** One self-study pass purchase: the provider's payment id (unique), what was charged and until when it is valid. */
export interface StudyPassInstance extends Model<InferAttributes<StudyPassInstance>, InferCreationAttributes<StudyPassInstance>> {
  id: CreationOptional<number>;
  userId: number;
  providerPaymentId: string;
  /** Integer minor units (cents), like the provider. */
  amountMinor: number;
  /** ISO 4217, lower-case as the provider sends it. */
  currency: string;
  status: CreationOptional<StudyPassStatus>;
  paidAt: CreationOptional<Date | null>;
  validUntil: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const studyPassModel: ModelEntry<StudyPassInstance> = {
  define: (sequelize) =>
    sequelize.define<StudyPassInstance>(
      "StudyPass",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        providerPaymentId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        amountMinor: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "pending", validate: { isIn: [["pending", "succeeded"]] } },
        paidAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        validUntil: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "StudyPasses" },
    ),
  associate: (m: Models) => {
    m.StudyPass.belongsTo(m.User, { foreignKey: "userId", as: "user" });
  },
};
