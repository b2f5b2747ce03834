import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE swaps (
      id serial PRIMARY KEY,
      coach_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      from_food_id integer REFERENCES foods(id) ON DELETE CASCADE,
      from_role varchar(40),
      to_food_id integer NOT NULL REFERENCES foods(id) ON DELETE CASCADE,
      volume_ratio double precision NOT NULL DEFAULT 1 CHECK (volume_ratio > 0 AND volume_ratio <= 4),
      note text NOT NULL DEFAULT '',
      tags text[] NOT NULL DEFAULT '{}',
      status varchar(10) NOT NULL DEFAULT 'draft' CHECK (status IN ('draft', 'published')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((from_food_id IS NULL) <> (from_role IS NULL))
    );
    CREATE INDEX swaps_coach_idx ON swaps (coach_id);
    CREATE TABLE invitations (
      id serial PRIMARY KEY,
      coach_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      email varchar(254) NOT NULL,
      token_hash char(64) NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      accepted_by integer REFERENCES users(id) ON DELETE SET NULL,
      revoked_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE client_targets (
      client_id integer PRIMARY KEY REFERENCES users(id) ON DELETE CASCADE,
      coach_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      targets jsonb NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE version_comments (
      id serial PRIMARY KEY,
      recipe_version_id integer NOT NULL REFERENCES recipe_versions(id) ON DELETE CASCADE,
      author_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      body text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE password_resets (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash char(64) NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE password_resets; DROP TABLE version_comments; DROP TABLE client_targets; DROP TABLE invitations; DROP TABLE swaps;');
};
