import { defaultProcess } from '@/lib/recipes/stages';
import type { RecipeContent, TastingInput } from '@/lib/schemas/recipes';
import { BottleFormat, Ingredient, Organisation, Recipe, User } from '@/server/db';
import { logger } from '@/server/logger';
import { addTasting, createRecipe, saveRecipe } from '@/server/services/recipes';

import { DEMO_BREWERY } from './demo';
import { seedDemoBatches } from './demo-batches';

/** USDA SR25 record of each ingredient the demo recipes use (all in the starter library). */
const RECORDS = {
  blackberries: '09042',
  elderberries: '09088',
  rhubarb: '09307',
  shortbread: '18192',
  vanilla: '02050',
  ginger: '11216',
  limeJuice: '09160',
  sourCherries: '09063',
  cardamom: '02006',
} as const;

type Key = keyof typeof RECORDS;

interface DemoRecipe {
  name: string;
  notes: string;
  content: (ids: Record<Key, number>, bottle: number) => RecipeContent;
  tastings: TastingInput[];
  /** A second version saved by the developer after tasting. */
  revise?: (content: RecipeContent) => RecipeContent;
}

const base = (over: Partial<RecipeContent['baseBrew']> = {}): RecipeContent['baseBrew'] => ({
  name: 'Wrenfield black tea base',
  residualSugarGPerL: 3,
  ph: 3.2,
  abvPercent: 0.15,
  residualCo2Volumes: null,
  lastOpenTempC: 21,
  ...over,
});

const process = (method: 'in-bottle' | 'steep-strain') => defaultProcess(method, 12);

/** The invented Wrenfield flavours: two steeped, two flavoured in the bottle, at different stages of development. */
const RECIPES: DemoRecipe[] = [
  {
    name: 'Hedgerow Bramble',
    notes: 'Blackberry and elderberry, steeped cold; jammy and dry.',
    content: (ids, bottle) => ({
      baseBrew: base({ residualSugarGPerL: 1, abvPercent: 0.05 }),
      lines: [
        { ingredientId: ids.blackberries, amount: 35, unit: 'g-per-l', extractionPct: 50 },
        { ingredientId: ids.elderberries, amount: 6, unit: 'g-per-l', extractionPct: 50 },
      ],
      sugars: [{ type: 'sucrose', gPerL: 0 }],
      process: process('steep-strain'),
      bottleFormatId: bottle,
      targetVolumes: 2.2,
      sweetnessNote: 'dry',
      highestTempC: 25,
    }),
    tastings: [
      {
        tastedOn: '2026-11-18',
        notes: 'Deep colour, gentle fizz; the fruit sugar alone is enough.',
        sweetness: 2,
        sourness: 3,
        fizz: 3,
        flavour: 4,
        sugarAddition: null,
      },
    ],
  },
  {
    name: 'Rhubarb Custard Tart',
    notes: 'Rhubarb with crumbled shortbread and vanilla left in the bottle: a dessert in a glass.',
    content: (ids, bottle) => ({
      baseBrew: base({ residualSugarGPerL: 4 }),
      lines: [
        { ingredientId: ids.rhubarb, amount: 40, unit: 'g-per-l', extractionPct: 100 },
        { ingredientId: ids.shortbread, amount: 3, unit: 'g-per-bottle', extractionPct: 100 },
        { ingredientId: ids.vanilla, amount: 0.5, unit: 'g-per-l', extractionPct: 100 },
      ],
      sugars: [{ type: 'sucrose', gPerL: 6 }],
      process: process('in-bottle'),
      bottleFormatId: bottle,
      targetVolumes: 3,
      sweetnessNote: 'sweet',
      highestTempC: 35,
    }),
    tastings: [
      {
        tastedOn: '2026-11-20',
        notes: 'Lovely aroma; test bottle gushed after five days. Too much sugar with the biscuit in.',
        sweetness: 4,
        sourness: 2,
        fizz: 5,
        flavour: 4,
        sugarAddition: null,
      },
    ],
  },
  {
    name: 'Ginger Lime Snap',
    notes: 'Fresh ginger steeped with lime juice and a little honey.',
    content: (ids, bottle) => ({
      baseBrew: base({ residualSugarGPerL: 1, abvPercent: 0.05 }),
      lines: [
        { ingredientId: ids.ginger, amount: 8, unit: 'g-per-l', extractionPct: 60 },
        { ingredientId: ids.limeJuice, amount: 15, unit: 'g-per-l', extractionPct: 100 },
      ],
      sugars: [{ type: 'honey', gPerL: 2 }],
      process: process('steep-strain'),
      bottleFormatId: bottle,
      targetVolumes: 2.4,
      sweetnessNote: 'off-dry',
      highestTempC: 25,
    }),
    tastings: [
      {
        tastedOn: '2026-11-22',
        notes: 'Ginger heat is right; lime fades.',
        sweetness: 3,
        sourness: 3,
        fizz: 3,
        flavour: 3,
        sugarAddition: null,
      },
      {
        tastedOn: '2026-11-26',
        notes: 'More lime in version 2 is brighter.',
        sweetness: 3,
        sourness: 4,
        fizz: 4,
        flavour: 4,
        sugarAddition: null,
      },
    ],
    revise: (c) => ({ ...c, lines: c.lines.map((l, i) => (i === 1 ? { ...l, amount: 22 } : l)) }),
  },
  {
    name: 'Sour Cherry Cardamom',
    notes: 'Sour cherries and cracked cardamom in the bottle; still in early trials.',
    content: (ids, bottle) => ({
      baseBrew: base({ residualSugarGPerL: 0.5, abvPercent: 0.05 }),
      lines: [
        { ingredientId: ids.sourCherries, amount: 35, unit: 'g-per-l', extractionPct: 100 },
        { ingredientId: ids.cardamom, amount: 0.3, unit: 'g-per-l', extractionPct: 100 },
      ],
      sugars: [{ type: 'sucrose', gPerL: 0 }],
      process: process('in-bottle'),
      bottleFormatId: bottle,
      targetVolumes: 2.4,
      sweetnessNote: 'tart',
      highestTempC: 25,
    }),
    tastings: [
      {
        tastedOn: '2026-11-28',
        notes: 'Cardamom too shy; cherries carry it. Too tart: a little sugar.',
        sweetness: 1,
        sourness: 5,
        fizz: 2,
        flavour: 3,
        sugarAddition: { type: 'sucrose', grams: 0.5, toMl: 473 },
      },
    ],
  },
];

/** Adds the demo recipes to the demo brewery once, after the ingredient library is filled. */
export async function seedDemoRecipesIfEmpty(): Promise<boolean> {
  const brewery = await Organisation.findOne({ where: { name: DEMO_BREWERY } });
  if (!brewery || (await Recipe.count({ where: { organisationId: brewery.id } })) > 0) return false;
  const developer = await User.findOne({ where: { organisationId: brewery.id, role: 'developer' } });
  const bottle = await BottleFormat.findOne({ where: { organisationId: brewery.id, liquidMl: 473 } });
  if (!developer || !bottle) return false;
  const rows = await Ingredient.findAll({ where: { organisationId: null, sourceRecord: Object.values(RECORDS) } });
  const byRecord = new Map(rows.map((r) => [r.sourceRecord, r.id]));
  const ids = Object.fromEntries(Object.entries(RECORDS).map(([key, record]) => [key, byRecord.get(record)])) as Record<
    Key,
    number
  >;
  if (Object.values(ids).some((id) => id === undefined)) return false;
  const auth = { userId: developer.id, organisationId: brewery.id, role: developer.role };
  for (const demo of RECIPES) {
    const created = await createRecipe(auth, {
      name: demo.name,
      flavourNotes: demo.notes,
      content: demo.content(ids, bottle.id),
    });
    if (demo.revise) {
      await saveRecipe(auth, created.id, {
        name: demo.name,
        flavourNotes: demo.notes,
        content: demo.revise(created.content),
        baseVersion: 1,
        note: 'More lime after the first tasting',
      });
    }
    for (const tasting of demo.tastings) await addTasting(auth, created.id, tasting);
  }
  await seedDemoBatches();
  logger.info('demo recipes and batches seeded');
  return true;
}
