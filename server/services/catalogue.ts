import type { Sequelize } from 'sequelize';
import type { CatalogueFood, DietFlag, Portion, Role } from '../../shared/food';

interface FoodRow {
  id: number;
  source: 'usda-sr28' | 'custom';
  source_id: string;
  name: string;
  source_name: string;
  food_group: string;
  kcal: number;
  protein_g: number;
  fat_g: number;
  sat_fat_g: number;
  carbs_g: number;
  fiber_g: number;
  sugar_g: number;
  sodium_mg: number;
  water_g: number | null;
  density_g_per_ml: number;
  density_source: 'portion' | 'role-default';
  roles: Role[];
  diet: DietFlag[];
  branded: boolean;
  owner_id: number | null;
}

interface PortionRow {
  food_id: number;
  label: string;
  amount: number;
  measure: string;
  grams: number;
}

export interface StoredFood extends CatalogueFood {
  /** the coach who entered a custom food; null for catalogue foods */
  ownerId: number | null;
}

function toFood(row: FoodRow, portions: Portion[]): StoredFood {
  return {
    id: row.id,
    source: row.source,
    sourceId: row.source_id,
    name: row.name,
    sourceName: row.source_name,
    foodGroup: row.food_group,
    per100g: {
      kcal: row.kcal,
      proteinG: row.protein_g,
      fatG: row.fat_g,
      satFatG: row.sat_fat_g,
      carbsG: row.carbs_g,
      fiberG: row.fiber_g,
      sugarG: row.sugar_g,
      sodiumMg: row.sodium_mg,
      waterG: row.water_g,
    },
    portions,
    densityGPerMl: row.density_g_per_ml,
    densitySource: row.density_source,
    roles: row.roles,
    diet: row.diet,
    branded: row.branded,
    ownerId: row.owner_id,
  };
}

/** Every food with its portions, read once from PostgreSQL. */
export async function readAllFoods(sequelize: Sequelize): Promise<StoredFood[]> {
  const [foods] = (await sequelize.query('SELECT * FROM foods ORDER BY id')) as [FoodRow[], unknown];
  const [portions] = (await sequelize.query('SELECT food_id, label, amount, measure, grams FROM food_portions ORDER BY food_id, seq')) as [
    PortionRow[],
    unknown,
  ];
  const byFood = new Map<number, Portion[]>();
  for (const p of portions) {
    const list = byFood.get(p.food_id) ?? [];
    list.push({ label: p.label, amount: p.amount, measure: p.measure, grams: p.grams });
    byFood.set(p.food_id, list);
  }
  return foods.map((row) => toFood(row, byFood.get(row.id) ?? []));
}
