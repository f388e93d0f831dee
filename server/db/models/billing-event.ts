import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/** A payment-provider webhook event the app has handled; the unique event id makes replays no-ops. */
export interface BillingEventInstance extends Model<InferAttributes<BillingEventInstance>, InferCreationAttributes<BillingEventInstance>> {
  id: CreationOptional<number>;
  providerEventId: string;
  type: string;
  providerPaymentId: string | null;
  outcome: string;
  createdAt: CreationOptional<Date>;
}

export const billingEventModel: ModelEntry<BillingEventInstance> = {
  define: (sequelize) =>
    sequelize.define<BillingEventInstance>(
      "BillingEvent",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        providerEventId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        type: { type: DataTypes.STRING(80), allowNull: false },
        providerPaymentId: { type: DataTypes.STRING(255), allowNull: true },
        outcome: { type: DataTypes.STRING(20), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { tableName: "BillingEvents", updatedAt: false },
    ),
};
