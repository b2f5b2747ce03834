/**
 * Nutrition Facts panels of invented products (no real brands), drawn as HTML in several layouts for
 * Chromium to render and screenshot. Values are per serving as a panel prints them (FDA 21 CFR
 * 101.9(c) rounding); "Less than 1g" reads back as 0.5 g (shared/label-text.ts).
 */
export interface PanelSpec {
  product: string;
  layout: 'vertical' | 'linear' | 'classic' | 'tabular';
  font: string;
  servingsPerContainer: string;
  servingLabel: string;
  servingSizeG: number;
  kcal: number;
  fat: string;
  satFat: string;
  sodiumMg: string;
  carbs: string;
  fiber: string;
  sugars: string;
  protein: string;
  /** what each field must read back as */
  expected: {
    servingSizeG: number;
    servingLabel: string;
    kcal: number;
    fatG: number;
    satFatG: number;
    carbsG: number;
    fiberG: number;
    sugarG: number;
    proteinG: number;
    sodiumMg: number;
  };
}

const DV = { fat: 78, satFat: 20, sodium: 2300, carbs: 275, fiber: 28 };

function pct(amount: number, dv: number) {
  return `${Math.round((amount / dv) * 100)}%`;
}

function rule(px: number) {
  return `border-bottom:${px}px solid #111;`;
}

function row(name: string, amount: string, percent: string, opts: { bold?: boolean; indent?: boolean; thick?: number } = {}) {
  return `<div style="display:flex;justify-content:space-between;padding:2px 0;${rule(opts.thick ?? 1)}${opts.indent ? 'padding-left:16px;' : ''}">
    <span>${opts.bold ? `<b>${name}</b>` : name} ${amount}</span><b>${percent}</b></div>`;
}

function vertical(p: PanelSpec) {
  const e = p.expected;
  return `<div style="font-size:34px;font-weight:900;line-height:1">Nutrition Facts</div>
  <div style="${rule(1)}font-size:15px">${p.servingsPerContainer} servings per container</div>
  <div style="display:flex;justify-content:space-between;font-weight:800;font-size:17px;${rule(10)}"><span>Serving size</span><span>${p.servingLabel} (${p.servingSizeG}g)</span></div>
  <div style="font-size:13px;font-weight:800">Amount per serving</div>
  <div style="display:flex;justify-content:space-between;font-size:30px;font-weight:900;${rule(5)}"><span>Calories</span><span>${p.kcal}</span></div>
  <div style="text-align:right;font-size:13px;font-weight:800;${rule(1)}">% Daily Value*</div>
  ${row('Total Fat', p.fat, pct(e.fatG, DV.fat), { bold: true })}
  ${row('Saturated Fat', p.satFat, pct(e.satFatG, DV.satFat), { indent: true })}
  ${row('Trans Fat', '0g', '', { indent: true })}
  ${row('Cholesterol', '0mg', '0%', { bold: true })}
  ${row('Sodium', `${p.sodiumMg}`, pct(e.sodiumMg, DV.sodium), { bold: true })}
  ${row('Total Carbohydrate', p.carbs, pct(e.carbsG, DV.carbs), { bold: true })}
  ${row('Dietary Fiber', p.fiber, pct(e.fiberG, DV.fiber), { indent: true })}
  ${row('Total Sugars', p.sugars, '', { indent: true })}
  ${row('Includes 0g Added Sugars', '', '0%', { indent: true })}
  ${row('Protein', p.protein, '', { bold: true, thick: 10 })}
  <div style="font-size:11px">* The % Daily Value tells you how much a nutrient in a serving of food contributes to a daily diet. 2,000 calories a day is used for general nutrition advice.</div>`;
}

function classic(p: PanelSpec) {
  const e = p.expected;
  return `<div style="font-size:30px;font-weight:900">Nutrition Facts</div>
  <div style="font-size:14px">Serving Size ${p.servingLabel} (${p.servingSizeG}g)</div>
  <div style="font-size:14px;${rule(8)}">Servings Per Container ${p.servingsPerContainer}</div>
  <div style="font-size:12px;font-weight:700;${rule(1)}">Amount Per Serving</div>
  <div style="display:flex;justify-content:space-between;font-size:14px;${rule(4)}"><span><b>Calories</b> ${p.kcal}</span><span>Calories from Fat ${Math.round(e.fatG * 9)}</span></div>
  ${row('Total Fat', p.fat, pct(e.fatG, DV.fat), { bold: true })}
  ${row('Saturated Fat', p.satFat, pct(e.satFatG, DV.satFat), { indent: true })}
  ${row('Sodium', p.sodiumMg, pct(e.sodiumMg, DV.sodium), { bold: true })}
  ${row('Total Carbohydrate', p.carbs, pct(e.carbsG, DV.carbs), { bold: true })}
  ${row('Dietary Fiber', p.fiber, pct(e.fiberG, DV.fiber), { indent: true })}
  ${row('Sugars', p.sugars, '', { indent: true })}
  ${row('Protein', p.protein, '', { bold: true, thick: 8 })}`;
}

function linear(p: PanelSpec) {
  const e = p.expected;
  return `<div style="font-size:16px;line-height:1.45;max-width:640px"><b style="font-size:20px">Nutrition Facts</b> Servings: ${p.servingsPerContainer},
  <b>Serving size ${p.servingLabel} (${p.servingSizeG}g)</b>, Amount per serving: <b>Calories ${p.kcal}</b>, <b>Total Fat</b> ${p.fat} (${pct(e.fatG, DV.fat)} DV),
  Sat. Fat ${p.satFat} (${pct(e.satFatG, DV.satFat)} DV), Trans Fat 0g, <b>Cholest.</b> 0mg (0% DV), <b>Sodium</b> ${p.sodiumMg} (${pct(e.sodiumMg, DV.sodium)} DV),
  <b>Total Carb.</b> ${p.carbs} (${pct(e.carbsG, DV.carbs)} DV), Fiber ${p.fiber} (${pct(e.fiberG, DV.fiber)} DV), Total Sugars ${p.sugars} (Incl. 0g Added Sugars, 0% DV), <b>Protein</b> ${p.protein}.</div>`;
}

function tabular(p: PanelSpec) {
  const e = p.expected;
  return `<div style="display:flex;gap:18px;align-items:flex-start">
    <div style="width:230px"><div style="font-size:30px;font-weight:900;line-height:1">Nutrition Facts</div>
      <div style="font-size:13px">${p.servingsPerContainer} servings per container</div>
      <div style="font-size:14px;font-weight:800;${rule(8)}">Serving size ${p.servingLabel} (${p.servingSizeG}g)</div>
      <div style="font-size:26px;font-weight:900">Calories ${p.kcal}</div></div>
    <div style="width:300px">
      ${row('Total Fat', p.fat, pct(e.fatG, DV.fat), { bold: true })}
      ${row('Saturated Fat', p.satFat, pct(e.satFatG, DV.satFat), { indent: true })}
      ${row('Sodium', p.sodiumMg, pct(e.sodiumMg, DV.sodium), { bold: true })}</div>
    <div style="width:300px">
      ${row('Total Carbohydrate', p.carbs, pct(e.carbsG, DV.carbs), { bold: true })}
      ${row('Dietary Fiber', p.fiber, pct(e.fiberG, DV.fiber), { indent: true })}
      ${row('Total Sugars', p.sugars, '', { indent: true })}
      ${row('Protein', p.protein, '', { bold: true })}</div></div>`;
}

export function panelHtml(p: PanelSpec) {
  const body = { vertical, classic, linear, tabular }[p.layout](p);
  const width = p.layout === 'vertical' || p.layout === 'classic' ? 'width:300px;' : '';
  return `<!doctype html><html><body style="margin:0;padding:16px;background:#fff;color:#111">
  <div style="font-size:12px;color:#555;margin-bottom:6px">${p.product}</div>
  <div id="panel" style="display:inline-block;border:2px solid #111;padding:6px 9px;font-family:${p.font};${width}">${body}</div></body></html>`;
}

/** The invented low-carb tortilla's panel as a cook types it in (45 g = "1 tortilla"): the first panel's reading, the label food the API tests save, and what the OCR text test expects. */
export const TORTILLA_LABEL = {
  servingSizeG: 45,
  servingLabel: '1 tortilla',
  kcal: 70,
  fatG: 2.5,
  satFatG: 0,
  carbsG: 19,
  fiberG: 14,
  sugarG: 0.5,
  proteinG: 6,
  sodiumMg: 450,
};

/**
 * Panels 1–5 tuned the reader. Panels 6–10 were held out for its first run (3 of 5 read exactly), then
 * two of their failures tuned it too; panels 11–15 (HELD_OUT_PANELS) were written after all tuning.
 */
export const PANELS: PanelSpec[] = [
  {
    product: 'Cloudmeadow carb-smart tortillas',
    layout: 'vertical',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: '8',
    servingLabel: '1 tortilla',
    servingSizeG: 45,
    kcal: 70,
    fat: '2.5g',
    satFat: '0g',
    sodiumMg: '450mg',
    carbs: '19g',
    fiber: '14g',
    sugars: 'Less than 1g',
    protein: '6g',
    expected: TORTILLA_LABEL,
  },
  {
    product: 'Ridgeline turkey pepperoni',
    layout: 'vertical',
    font: 'Liberation Sans Narrow, Arial Narrow, sans-serif',
    servingsPerContainer: 'About 6',
    servingLabel: '17 slices',
    servingSizeG: 30,
    kcal: 70,
    fat: '3.5g',
    satFat: '1g',
    sodiumMg: '560mg',
    carbs: '0g',
    fiber: '0g',
    sugars: '0g',
    protein: '9g',
    expected: { servingSizeG: 30, servingLabel: '17 slices', kcal: 70, fatG: 3.5, satFatG: 1, carbsG: 0, fiberG: 0, sugarG: 0, proteinG: 9, sodiumMg: 560 },
  },
  {
    product: 'Stonebrook peanut protein bar',
    layout: 'linear',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: '1',
    servingLabel: '1 bar',
    servingSizeG: 40,
    kcal: 190,
    fat: '7g',
    satFat: '1.5g',
    sodiumMg: '150mg',
    carbs: '18g',
    fiber: '9g',
    sugars: '2g',
    protein: '15g',
    expected: { servingSizeG: 40, servingLabel: '1 bar', kcal: 190, fatG: 7, satFatG: 1.5, carbsG: 18, fiberG: 9, sugarG: 2, proteinG: 15, sodiumMg: 150 },
  },
  {
    product: 'Harbor Mill high-fiber bran flakes',
    layout: 'classic',
    font: 'Liberation Serif, Times New Roman, serif',
    servingsPerContainer: '12',
    servingLabel: '2/3 cup',
    servingSizeG: 55,
    kcal: 170,
    fat: '1g',
    satFat: '0g',
    sodiumMg: '210mg',
    carbs: '44g',
    fiber: '13g',
    sugars: '9g',
    protein: '5g',
    expected: { servingSizeG: 55, servingLabel: '2/3 cup', kcal: 170, fatG: 1, satFatG: 0, carbsG: 44, fiberG: 13, sugarG: 9, proteinG: 5, sodiumMg: 210 },
  },
  {
    product: 'Maple Hollow light wheat bread',
    layout: 'tabular',
    font: 'DejaVu Sans, Verdana, sans-serif',
    servingsPerContainer: '11',
    servingLabel: '2 slices',
    servingSizeG: 45,
    kcal: 90,
    fat: '1g',
    satFat: '0g',
    sodiumMg: '230mg',
    carbs: '19g',
    fiber: '6g',
    sugars: 'Less than 1g',
    protein: '5g',
    expected: { servingSizeG: 45, servingLabel: '2 slices', kcal: 90, fatG: 1, satFatG: 0, carbsG: 19, fiberG: 6, sugarG: 0.5, proteinG: 5, sodiumMg: 230 },
  },
  // held out
  {
    product: 'Quietfield fat-free cheddar shreds',
    layout: 'vertical',
    font: 'DejaVu Sans, Verdana, sans-serif',
    servingsPerContainer: 'About 8',
    servingLabel: '1/4 cup',
    servingSizeG: 28,
    kcal: 45,
    fat: '0g',
    satFat: '0g',
    sodiumMg: '280mg',
    carbs: '2g',
    fiber: '0g',
    sugars: 'Less than 1g',
    protein: '9g',
    expected: { servingSizeG: 28, servingLabel: '1/4 cup', kcal: 45, fatG: 0, satFatG: 0, carbsG: 2, fiberG: 0, sugarG: 0.5, proteinG: 9, sodiumMg: 280 },
  },
  {
    product: 'Sunward chickpea protein penne',
    layout: 'classic',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: 'About 4',
    servingLabel: '2 oz',
    servingSizeG: 56,
    kcal: 190,
    fat: '3.5g',
    satFat: '0.5g',
    sodiumMg: '65mg',
    carbs: '32g',
    fiber: '8g',
    sugars: '5g',
    protein: '14g',
    expected: { servingSizeG: 56, servingLabel: '2 oz', kcal: 190, fatG: 3.5, satFatG: 0.5, carbsG: 32, fiberG: 8, sugarG: 5, proteinG: 14, sodiumMg: 65 },
  },
  {
    product: 'Orchard Lane powdered peanut spread',
    layout: 'linear',
    font: 'Liberation Serif, Times New Roman, serif',
    servingsPerContainer: '15',
    servingLabel: '2 tbsp',
    servingSizeG: 12,
    kcal: 50,
    fat: '1.5g',
    satFat: '0g',
    sodiumMg: '95mg',
    carbs: '4g',
    fiber: '2g',
    sugars: '2g',
    protein: '6g',
    expected: { servingSizeG: 12, servingLabel: '2 tbsp', kcal: 50, fatG: 1.5, satFatG: 0, carbsG: 4, fiberG: 2, sugarG: 2, proteinG: 6, sodiumMg: 95 },
  },
  {
    product: 'Glenwater plain nonfat skyr',
    layout: 'tabular',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: '1',
    servingLabel: '1 container',
    servingSizeG: 150,
    kcal: 90,
    fat: '0g',
    satFat: '0g',
    sodiumMg: '55mg',
    carbs: '6g',
    fiber: '0g',
    sugars: '4g',
    protein: '16g',
    expected: { servingSizeG: 150, servingLabel: '1 container', kcal: 90, fatG: 0, satFatG: 0, carbsG: 6, fiberG: 0, sugarG: 4, proteinG: 16, sodiumMg: 55 },
  },
  {
    product: 'Tallpine lean chicken sausage',
    layout: 'vertical',
    font: 'Liberation Serif, Georgia, serif',
    servingsPerContainer: '5',
    servingLabel: '1 link',
    servingSizeG: 85,
    kcal: 110,
    fat: '6g',
    satFat: '1.5g',
    sodiumMg: '1,050mg',
    carbs: '2g',
    fiber: 'Less than 1g',
    sugars: '1g',
    protein: '13g',
    expected: { servingSizeG: 85, servingLabel: '1 link', kcal: 110, fatG: 6, satFatG: 1.5, carbsG: 2, fiberG: 0.5, sugarG: 1, proteinG: 13, sodiumMg: 1050 },
  },
];

/** Written after the reader's last change and never tuned on. */
export const HELD_OUT_PANELS: PanelSpec[] = [
  {
    product: 'Birchwick light string cheese',
    layout: 'vertical',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: '12',
    servingLabel: '1 stick',
    servingSizeG: 24,
    kcal: 50,
    fat: '2.5g',
    satFat: '1.5g',
    sodiumMg: '200mg',
    carbs: '1g',
    fiber: '0g',
    sugars: '0g',
    protein: '7g',
    expected: { servingSizeG: 24, servingLabel: '1 stick', kcal: 50, fatG: 2.5, satFatG: 1.5, carbsG: 1, fiberG: 0, sugarG: 0, proteinG: 7, sodiumMg: 200 },
  },
  {
    product: 'Copperfield egg white bites',
    layout: 'classic',
    font: 'DejaVu Sans, Verdana, sans-serif',
    servingsPerContainer: '2',
    servingLabel: '2 bites',
    servingSizeG: 130,
    kcal: 170,
    fat: '8g',
    satFat: '5g',
    sodiumMg: '470mg',
    carbs: '11g',
    fiber: '0g',
    sugars: '2g',
    protein: '12g',
    expected: { servingSizeG: 130, servingLabel: '2 bites', kcal: 170, fatG: 8, satFatG: 5, carbsG: 11, fiberG: 0, sugarG: 2, proteinG: 12, sodiumMg: 470 },
  },
  {
    product: 'Winterhaven reduced-sugar marinara',
    layout: 'vertical',
    font: 'Liberation Serif, Georgia, serif',
    servingsPerContainer: 'About 6',
    servingLabel: '1/2 cup',
    servingSizeG: 125,
    kcal: 40,
    fat: '1.5g',
    satFat: '0g',
    sodiumMg: '390mg',
    carbs: '6g',
    fiber: '2g',
    sugars: '3g',
    protein: '1g',
    expected: { servingSizeG: 125, servingLabel: '1/2 cup', kcal: 40, fatG: 1.5, satFatG: 0, carbsG: 6, fiberG: 2, sugarG: 3, proteinG: 1, sodiumMg: 390 },
  },
  {
    product: 'Pinecrest cauliflower pizza crust',
    layout: 'linear',
    font: 'Liberation Sans, Arial, sans-serif',
    servingsPerContainer: '3',
    servingLabel: '1/3 crust',
    servingSizeG: 57,
    kcal: 110,
    fat: '4g',
    satFat: '2g',
    sodiumMg: '310mg',
    carbs: '14g',
    fiber: '3g',
    sugars: 'Less than 1g',
    protein: '5g',
    expected: { servingSizeG: 57, servingLabel: '1/3 crust', kcal: 110, fatG: 4, satFatG: 2, carbsG: 14, fiberG: 3, sugarG: 0.5, proteinG: 5, sodiumMg: 310 },
  },
  {
    product: 'Eastmoor lean ground turkey 99/1',
    layout: 'tabular',
    font: 'DejaVu Sans, Verdana, sans-serif',
    servingsPerContainer: 'About 4',
    servingLabel: '4 oz',
    servingSizeG: 112,
    kcal: 120,
    fat: '1.5g',
    satFat: '0.5g',
    sodiumMg: '65mg',
    carbs: '0g',
    fiber: '0g',
    sugars: '0g',
    protein: '26g',
    expected: { servingSizeG: 112, servingLabel: '4 oz', kcal: 120, fatG: 1.5, satFatG: 0.5, carbsG: 0, fiberG: 0, sugarG: 0, proteinG: 26, sodiumMg: 65 },
  },
];
