import type { Migration } from './types';

/**
 * State that used to live in one process's memory, so that several app processes on one database
 * agree: rate-limit counters (the table layout rate-limiter-flexible's PostgreSQL store expects;
 * UNLOGGED because counters need no crash safety and skip the write-ahead log) and the development
 * outbox written by the fake SMTP server.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE UNLOGGED TABLE rate_limits (
      key varchar(255) PRIMARY KEY,
      points integer NOT NULL DEFAULT 0,
      expire bigint
    );
    CREATE INDEX rate_limits_expire_idx ON rate_limits (expire);
    CREATE TABLE dev_outbox (
      id uuid PRIMARY KEY,
      sender text NOT NULL,
      recipients text[] NOT NULL,
      subject text NOT NULL,
      body_text text NOT NULL,
      body_html text,
      message_id text,
      received_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX dev_outbox_received_idx ON dev_outbox (received_at);
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE dev_outbox; DROP TABLE rate_limits;');
};
