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
import type { CohortInstance } from "./cohort";

export const INVITATION_STATUSES = ["pending", "sent", "accepted", "revoked"] as const;
export type InvitationStatus = (typeof INVITATION_STATUSES)[number];

/**
 * An e-mail invitation to join a cohort. The token in the link is random (256 bits) and only its
 * SHA-256 is stored; it is replaced at every send, expires, and works once (status -> accepted).
 * "pending" = not delivered yet (queued, or the mail server failed and a retry is scheduled).
 */
export interface InvitationInstance extends Model<InferAttributes<InvitationInstance>, InferCreationAttributes<InvitationInstance>> {
  id: CreationOptional<number>;
  cohortId: number;
  email: string;
  displayName: string | null;
  tokenHash: CreationOptional<string | null>;
  status: CreationOptional<InvitationStatus>;
  expiresAt: CreationOptional<Date | null>;
  sendAttempts: CreationOptional<number>;
  lastSendError: CreationOptional<string | null>;
  nextSendAt: CreationOptional<Date | null>;
  sentAt: CreationOptional<Date | null>;
  acceptedAt: CreationOptional<Date | null>;
  acceptedUserId: CreationOptional<number | null>;
  invitedById: number | null;
  linkBase: string;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  cohort?: NonAttribute<CohortInstance>;
}

export const invitationModel: ModelEntry<InvitationInstance> = {
  define: (sequelize) =>
    sequelize.define<InvitationInstance>(
      "Invitation",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        cohortId: { type: DataTypes.INTEGER, allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        displayName: { type: DataTypes.STRING(120), allowNull: true },
        tokenHash: { type: DataTypes.STRING(64), allowNull: true, defaultValue: null },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "pending", validate: { isIn: [INVITATION_STATUSES as unknown as string[]] } },
        expiresAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        sendAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastSendError: { type: DataTypes.STRING(300), allowNull: true, defaultValue: null },
        nextSendAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        sentAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        acceptedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        acceptedUserId: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        invitedById: { type: DataTypes.INTEGER, allowNull: true },
        linkBase: { type: DataTypes.STRING(200), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Invitations" },
    ),
  associate: (m: Models) => {
    m.Invitation.belongsTo(m.Cohort, { foreignKey: "cohortId", as: "cohort" });
  },
};
