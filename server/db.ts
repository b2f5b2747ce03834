import { Sequelize } from 'sequelize';

export function createSequelize(databaseUrl: string): Sequelize {
  if (!databaseUrl) throw new Error('DATABASE_URL is not set.');
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000 },
    define: { underscored: true },
  });
}
