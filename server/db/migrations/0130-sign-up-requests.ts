import type { QueryInterface } from 'sequelize';

// A sign-up waiting for its address to be confirmed: the account and household are made only when the link
// mailed to that address is used, so sign-up answers alike whether or not the address already has an account.
// Only a SHA-256 fingerprint of the link's token is kept. No household yet, so no household_id.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.sequelize.query(
      `CREATE TABLE sign_up_requests (
         id uuid PRIMARY KEY,
         email varchar(254) NOT NULL,
         name varchar(200) NOT NULL,
         household_name varchar(200) NOT NULL,
         password_hash varchar(100) NOT NULL,
         token_hash char(64) NOT NULL UNIQUE,
         expires_at timestamptz NOT NULL,
         created_at timestamptz NOT NULL DEFAULT now(),
         updated_at timestamptz NOT NULL DEFAULT now()
       )`,
      { transaction },
    );
    await qi.sequelize.query('CREATE INDEX sign_up_requests_email ON sign_up_requests (email)', { transaction });
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query('DROP TABLE IF EXISTS sign_up_requests');
}
