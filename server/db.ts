import { Sequelize } from 'sequelize';

export function createSequelize(databaseUrl: string): Sequelize {
  if (!databaseUrl) throw new Error('DATABASE_URL is not set.');
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    // Sequelize drops a pooled connection on its 'error' event; a short acquire and connect timeout
    // turns "PostgreSQL is away" into a quick 503 instead of a minute-long hang.
    pool: { max: 10, min: 0, idle: 10_000, acquire: 10_000 },
    dialectOptions: { connectionTimeoutMillis: 5_000 },
    define: { underscored: true },
  });
}
