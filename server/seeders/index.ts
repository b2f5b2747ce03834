import type { Sequelize } from 'sequelize';
import { initModels } from '../models';
import { seedDemoAccounts } from './demo-accounts';
import { seedCatalogue } from './catalogue';
import { seedDemoContent } from './demo-content';

export interface SeedReport {
  catalogue: { foods: number; skipped: boolean; ms: number };
  demoAccounts: number;
  demoContent: { recipes: number; swaps: number };
}

/** Idempotent: a second run adds nothing. */
export async function seed(sequelize: Sequelize, options: { demo: boolean }): Promise<SeedReport> {
  initModels(sequelize);
  const catalogue = await seedCatalogue(sequelize);
  const demoAccounts = options.demo ? await seedDemoAccounts() : 0;
  const demoContent = options.demo ? await seedDemoContent(sequelize) : { recipes: 0, swaps: 0 };
  return { catalogue, demoAccounts, demoContent };
}
