import { DataTypes } from "sequelize";
import type { Migration } from "./types";

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};
const fk = (table: string, onDelete: "CASCADE" | "SET NULL", allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: "id" },
  onDelete,
  onUpdate: "CASCADE",
});

/**
 * The instructors' workflow: e-mail invitations to a cohort (token stored hashed), the outbox of
 * the in-process SMTP fake, and a log that makes due-date reminders idempotent.
 */
export const teaching: Migration = {
  name: "0020-teaching",
  async up({ queryInterface: qi, sequelize, transaction }) {
    await qi.createTable(
      "Invitations",
      {
        id,
        cohortId: fk("Cohorts", "CASCADE"),
        email: { type: DataTypes.STRING(254), allowNull: false },
        displayName: { type: DataTypes.STRING(120), allowNull: true },
        /** SHA-256 (hex) of the current token; null until the first send. The raw token is never stored. */
        tokenHash: { type: DataTypes.STRING(64), allowNull: true, unique: true },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "pending" },
        expiresAt: { type: DataTypes.DATE, allowNull: true },
        sendAttempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastSendError: { type: DataTypes.STRING(300), allowNull: true },
        nextSendAt: { type: DataTypes.DATE, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        acceptedUserId: fk("Users", "SET NULL", true),
        invitedById: fk("Users", "SET NULL", true),
        /** Origin the link in the e-mail points at (PUBLIC_URL, else the inviting request's origin). */
        linkBase: { type: DataTypes.STRING(200), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("Invitations", ["cohortId"], { transaction });
    await qi.addIndex("Invitations", ["status", "nextSendAt"], { transaction });
    // At most one open invitation per e-mail and cohort, even under racing requests.
    await sequelize.query(
      `CREATE UNIQUE INDEX invitations_open_per_cohort ON Invitations (cohortId, email) WHERE status IN ('pending','sent')`,
      { transaction },
    );
    await sequelize.query(
      `CREATE TRIGGER invitations_status_check BEFORE INSERT ON Invitations
       WHEN NEW.status NOT IN ('pending','sent','accepted','revoked')
       BEGIN SELECT RAISE(ABORT, 'invalid invitation status'); END;`,
      { transaction },
    );
    await sequelize.query(
      `CREATE TRIGGER invitations_status_check_update BEFORE UPDATE OF status ON Invitations
       WHEN NEW.status NOT IN ('pending','sent','accepted','revoked')
       BEGIN SELECT RAISE(ABORT, 'invalid invitation status'); END;`,
      { transaction },
    );

    await qi.createTable(
      "OutboxMessages",
      {
        id,
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        fromAddress: { type: DataTypes.STRING(320), allowNull: false },
        toAddress: { type: DataTypes.STRING(1000), allowNull: false },
        subject: { type: DataTypes.STRING(500), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: true },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex("OutboxMessages", ["receivedAt"], { transaction });

    await qi.createTable(
      "ReminderLogs",
      {
        id,
        userId: fk("Users", "CASCADE"),
        assignmentId: fk("Assignments", "CASCADE"),
        kind: { type: DataTypes.STRING(32), allowNull: false },
        /** Set by the run that is sending it; a stale claim (crashed run) may be taken over. */
        claimedAt: { type: DataTypes.DATE, allowNull: true },
        sentAt: { type: DataTypes.DATE, allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("ReminderLogs", ["userId", "assignmentId", "kind"], { unique: true, transaction });
  },

  async down({ queryInterface: qi, transaction }) {
    await qi.dropTable("ReminderLogs", { transaction });
    await qi.dropTable("OutboxMessages", { transaction });
    await qi.dropTable("Invitations", { transaction });
  },
};
