import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const householdRef = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'households', key: 'id' },
  onDelete: 'CASCADE',
};
const userRef = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'users', key: 'id' },
  onDelete: 'CASCADE',
};

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    const t = { transaction };
    // Settings of the whole installation, such as the VAPID key pair made on first start.
    await qi.createTable(
      'app_settings',
      {
        key: { type: DataTypes.STRING(60), primaryKey: true },
        value: { type: DataTypes.JSONB, allowNull: false },
        ...timestamps,
      },
      t,
    );

    // One row per browser a person turned notifications on in.
    await qi.createTable(
      'push_subscriptions',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        user_id: userRef,
        endpoint: { type: DataTypes.TEXT, allowNull: false, unique: true },
        p256dh: { type: DataTypes.STRING(200), allowNull: false },
        auth: { type: DataTypes.STRING(100), allowNull: false },
        user_agent: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('push_subscriptions', ['user_id'], t);

    // A person's choices; no row means the defaults.
    await qi.createTable(
      'notification_preferences',
      {
        user_id: { ...userRef, primaryKey: true },
        email_reminders: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        weekly_digest: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        reminder_hour: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 8 },
        days_before: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 2 },
        ...timestamps,
      },
      t,
    );
    await qi.sequelize.query(
      `ALTER TABLE notification_preferences ADD CONSTRAINT notification_preferences_hour CHECK (reminder_hour BETWEEN 0 AND 23),
       ADD CONSTRAINT notification_preferences_days CHECK (days_before BETWEEN 1 AND 14)`,
      t,
    );

    // The claim that makes a reminder go out once per jar, kind and person, whatever runs it.
    await qi.createTable(
      'reminder_deliveries',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        jar_id: {
          type: DataTypes.UUID,
          allowNull: false,
          references: { model: 'jars', key: 'id' },
          onDelete: 'CASCADE',
        },
        user_id: userRef,
        kind: { type: DataTypes.STRING(12), allowNull: false },
        use_by: { type: DataTypes.DATEONLY, allowNull: false },
        pushes_sent: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        email_sent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        problem: { type: DataTypes.TEXT, allowNull: true },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('reminder_deliveries', ['jar_id', 'kind', 'user_id'], {
      unique: true,
      name: 'reminder_deliveries_once',
      ...t,
    });
    await qi.addIndex('reminder_deliveries', ['household_id'], t);
    await qi.addIndex('reminder_deliveries', ['user_id'], t);
    await qi.sequelize.query(
      `ALTER TABLE reminder_deliveries ADD CONSTRAINT reminder_deliveries_kind CHECK (kind IN ('soon','today'))`,
      t,
    );

    // The weekly digest's claim: once per household, person and week.
    await qi.createTable(
      'digest_deliveries',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        user_id: userRef,
        week_of: { type: DataTypes.DATEONLY, allowNull: false },
        email_sent: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        problem: { type: DataTypes.TEXT, allowNull: true },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('digest_deliveries', ['household_id', 'user_id', 'week_of'], {
      unique: true,
      name: 'digest_deliveries_once',
      ...t,
    });
    await qi.addIndex('digest_deliveries', ['user_id'], t);

    await qi.createTable(
      'invitations',
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        household_id: householdRef,
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(10), allowNull: false },
        // SHA-256 of the link's token; the token itself is only ever in the e-mail.
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        invited_by: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        accepted_at: { type: DataTypes.DATE, allowNull: true },
        accepted_by: {
          type: DataTypes.UUID,
          allowNull: true,
          references: { model: 'users', key: 'id' },
          onDelete: 'SET NULL',
        },
        revoked_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      t,
    );
    await qi.addIndex('invitations', ['household_id'], t);
    await qi.addIndex('invitations', ['invited_by'], t);
    await qi.addIndex('invitations', ['accepted_by'], t);
    await qi.sequelize.query(
      `ALTER TABLE invitations ADD CONSTRAINT invitations_role CHECK (role IN ('keeper','cook','helper'))`,
      t,
    );
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  for (const table of [
    'invitations',
    'digest_deliveries',
    'reminder_deliveries',
    'notification_preferences',
    'push_subscriptions',
    'app_settings',
  ]) {
    await qi.dropTable(table);
  }
}
