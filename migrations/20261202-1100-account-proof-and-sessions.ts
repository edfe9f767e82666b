import { DataTypes, type QueryInterface } from "sequelize";
import { ref } from "@/models/migration-columns";

/**
 * Accounts a park can trust: a proven e-mail address, a session version that ends every earlier
 * session when it moves, single-use account links (address proof, password reset, e-mail change)
 * and a log of mails sent per recipient so no address can be flooded.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.addColumn("users", "email_verified_at", { type: DataTypes.DATE, allowNull: true }, { transaction });
    await qi.addColumn("users", "session_version", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 }, { transaction });
    // Accounts made before proof existed: staff, admins and the demo accounts were vouched for by
    // an invitation or the seed; self-made rider accounts prove their address at the next sign-in.
    await qi.sequelize.query(
      `UPDATE users SET email_verified_at = now()
        WHERE site_role = 'admin' OR email LIKE '%@demo.loamcast.test'
           OR id IN (SELECT user_id FROM park_memberships)`,
      { transaction },
    );
    await qi.createTable(
      "account_links",
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        user_id: ref("users"),
        purpose: { type: DataTypes.STRING(24), allowNull: false },
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        new_email: { type: DataTypes.STRING(254), allowNull: true },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        used_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("account_links", ["user_id", "purpose"], { transaction });
    await qi.createTable(
      "mail_sends",
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        recipient: { type: DataTypes.STRING(254), allowNull: false },
        purpose: { type: DataTypes.STRING(32), allowNull: false },
        sent_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("mail_sends", ["recipient", "purpose", "sent_at"], { transaction });
    await qi.createTable(
      "request_counts",
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        bucket: { type: DataTypes.STRING(32), allowNull: false },
        key: { type: DataTypes.STRING(254), allowNull: false },
        counted_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex("request_counts", ["bucket", "key", "counted_at"], { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable("request_counts", { transaction });
    await qi.dropTable("mail_sends", { transaction });
    await qi.dropTable("account_links", { transaction });
    await qi.removeColumn("users", "session_version", { transaction });
    await qi.removeColumn("users", "email_verified_at", { transaction });
  });
}
