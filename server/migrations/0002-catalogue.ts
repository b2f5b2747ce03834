import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE foods (
      id serial PRIMARY KEY,
      source varchar(20) NOT NULL CHECK (source IN ('usda-sr28', 'custom')),
      source_id varchar(40) NOT NULL,
      name text NOT NULL,
      source_name text NOT NULL,
      food_group varchar(4) NOT NULL DEFAULT '',
      kcal double precision NOT NULL,
      protein_g double precision NOT NULL,
      fat_g double precision NOT NULL,
      sat_fat_g double precision NOT NULL,
      carbs_g double precision NOT NULL,
      fiber_g double precision NOT NULL,
      sugar_g double precision NOT NULL,
      sodium_mg double precision NOT NULL,
      water_g double precision,
      density_g_per_ml double precision NOT NULL CHECK (density_g_per_ml > 0),
      density_source varchar(20) NOT NULL,
      roles text[] NOT NULL DEFAULT '{}',
      diet text[] NOT NULL DEFAULT '{}',
      branded boolean NOT NULL DEFAULT false,
      owner_id integer REFERENCES users(id) ON DELETE CASCADE,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (source, source_id)
    );
    CREATE TABLE food_portions (
      id serial PRIMARY KEY,
      food_id integer NOT NULL REFERENCES foods(id) ON DELETE CASCADE,
      seq integer NOT NULL,
      label text NOT NULL,
      amount double precision NOT NULL CHECK (amount > 0),
      measure text NOT NULL,
      grams double precision NOT NULL CHECK (grams > 0),
      UNIQUE (food_id, seq)
    );
    CREATE TABLE catalogue_meta (
      key varchar(40) PRIMARY KEY,
      value text NOT NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE food_portions; DROP TABLE foods; DROP TABLE catalogue_meta;');
};
