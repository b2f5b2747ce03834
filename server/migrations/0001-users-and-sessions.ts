import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    display_name: { type: DataTypes.STRING(80), allowNull: false },
    role: { type: DataTypes.STRING(10), allowNull: false },
    coach_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    unit_system: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'us' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.sequelize.query(`ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('cook','coach','admin'))`);
  // Table layout required by connect-pg-simple.
  await qi.sequelize.query(`
    CREATE TABLE "session" (
      "sid" varchar NOT NULL COLLATE "default" PRIMARY KEY,
      "sess" json NOT NULL,
      "expire" timestamp(6) NOT NULL
    );
    CREATE INDEX "IDX_session_expire" ON "session" ("expire");
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('session');
  await qi.dropTable('users');
};
