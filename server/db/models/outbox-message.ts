import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/** A message received by the in-process SMTP fake (demo and tests), parsed; admins read them at /admin/outbox. */
export interface OutboxMessageInstance
  extends Model<InferAttributes<OutboxMessageInstance>, InferCreationAttributes<OutboxMessageInstance>> {
  id: CreationOptional<number>;
  messageId: string | null;
  fromAddress: string;
  /** Envelope recipients, comma-separated. */
  toAddress: string;
  subject: string;
  text: string;
  html: string | null;
  sizeBytes: number;
  receivedAt: Date;
}

export const outboxMessageModel: ModelEntry<OutboxMessageInstance> = {
  define: (sequelize) =>
    sequelize.define<OutboxMessageInstance>(
      "OutboxMessage",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        fromAddress: { type: DataTypes.STRING(320), allowNull: false },
        toAddress: { type: DataTypes.STRING(1000), allowNull: false },
        subject: { type: DataTypes.STRING(500), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: true },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { tableName: "OutboxMessages", timestamps: false },
    ),
};
