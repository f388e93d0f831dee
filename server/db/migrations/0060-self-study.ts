import { DataTypes } from "sequelize";
import type { Migration } from "./types";

/**
 * Self-learners: Users.kind ("school" for every existing account, "self" for people who bought a
 * self-study pass), the passes they bought (one row per provider payment, unique) and the payment
 * provider's webhook events already handled (unique event id, so a replayed event does nothing).
 */
export const selfStudy: Migration = {
  name: "0060-self-study",
  async up({ queryInterface: qi, transaction }) {
    await qi.addColumn("Users", "kind", { type: DataTypes.STRING(8), allowNull: false, defaultValue: "school" }, { transaction });

    await qi.createTable(
      "StudyPasses",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false, references: { model: "Users", key: "id" }, onDelete: "CASCADE", onUpdate: "CASCADE" },
        providerPaymentId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        amountMinor: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.STRING(3), allowNull: false },
        /** "pending" until the provider confirms, then "succeeded". Declined attempts are deleted with their account. */
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "pending" },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        validUntil: { type: DataTypes.DATE, allowNull: true },
        createdAt: { type: DataTypes.DATE, allowNull: false },
        updatedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex("StudyPasses", ["userId", "status"], { transaction });

    await qi.createTable(
      "BillingEvents",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
        providerEventId: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        type: { type: DataTypes.STRING(80), allowNull: false },
        providerPaymentId: { type: DataTypes.STRING(255), allowNull: true },
        /** What the app did with it: "activated", "already_active", "unknown_payment", "amount_mismatch", "ignored". */
        outcome: { type: DataTypes.STRING(20), allowNull: false },
        createdAt: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
  },
  async down({ queryInterface: qi, transaction }) {
    await qi.dropTable("BillingEvents", { transaction });
    await qi.dropTable("StudyPasses", { transaction });
    await qi.removeColumn("Users", "kind", { transaction });
  },
};
