import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE recipes (
      id serial PRIMARY KEY,
      owner_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      title varchar(200) NOT NULL,
      servings integer NOT NULL CHECK (servings BETWEEN 1 AND 100),
      notes text NOT NULL DEFAULT '',
      method text NOT NULL DEFAULT '',
      photo_key varchar(200),
      photo_type varchar(40),
      revision integer NOT NULL DEFAULT 1,
      deleted_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX recipes_owner_idx ON recipes (owner_id) WHERE deleted_at IS NULL;
    CREATE TABLE recipe_versions (
      id serial PRIMARY KEY,
      recipe_id integer NOT NULL REFERENCES recipes(id) ON DELETE CASCADE,
      number integer NOT NULL CHECK (number >= 1),
      kind varchar(10) NOT NULL CHECK (kind IN ('original', 'rewrite', 'edit')),
      parent_number integer,
      servings integer NOT NULL CHECK (servings BETWEEN 1 AND 100),
      lines jsonb NOT NULL,
      targets jsonb,
      totals jsonb NOT NULL,
      per_serving jsonb NOT NULL,
      volume_ml double precision NOT NULL DEFAULT 0,
      note text NOT NULL DEFAULT '',
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (recipe_id, number)
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE recipe_versions; DROP TABLE recipes;');
};
