import type { Migration } from './types';

/**
 * What a paying coach and cook expect of coaching:
 * - one open invitation per address and coach (a second invite renews the first; older duplicates
 *   are withdrawn here, newest kept);
 * - a client's body stats for the energy estimate, kept on the server so every device sees them;
 * - when the owner of a version has read each comment on it (the unread badge).
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    UPDATE invitations SET revoked_at = now()
    WHERE accepted_at IS NULL AND revoked_at IS NULL AND id NOT IN (
      SELECT DISTINCT ON (coach_id, lower(email)) id FROM invitations
      WHERE accepted_at IS NULL AND revoked_at IS NULL
      ORDER BY coach_id, lower(email), created_at DESC, id DESC
    );
    CREATE UNIQUE INDEX invitations_open_per_address ON invitations (coach_id, lower(email)) WHERE accepted_at IS NULL AND revoked_at IS NULL;
    CREATE TABLE client_body_stats (
      client_id integer PRIMARY KEY REFERENCES users(id) ON DELETE CASCADE,
      coach_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      stats jsonb NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    ALTER TABLE version_comments ADD COLUMN owner_read_at timestamptz;
    UPDATE version_comments SET owner_read_at = now();
    CREATE INDEX version_comments_unread_idx ON version_comments (recipe_version_id) WHERE owner_read_at IS NULL;
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP INDEX version_comments_unread_idx;
    ALTER TABLE version_comments DROP COLUMN owner_read_at;
    DROP TABLE client_body_stats;
    DROP INDEX invitations_open_per_address;
  `);
};
