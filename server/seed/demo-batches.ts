import { Organisation, Recipe, User } from '@/server/db';
import * as batches from '@/server/services/batches';
import { approve, submit } from '@/server/services/reviews';

import { DEMO_BREWERY } from './demo';

/**
 * The demo brewery's floor records (an invented scenario): Ginger Lime Snap approved, one batch released with its
 * readings, lots and sign-offs, and one conditioning whose test bottle reads above the plan (a caution).
 */
export async function seedDemoBatches(): Promise<void> {
  const brewery = await Organisation.findOne({ where: { name: DEMO_BREWERY } });
  if (!brewery) return;
  const people = await User.findAll({ where: { organisationId: brewery.id } });
  const as = (role: string) => {
    const person = people.find((p) => p.role === role)!;
    return { userId: person.id, organisationId: brewery.id, role: person.role };
  };
  const [owner, developer, brewer] = [as('owner'), as('developer'), as('brewer')];
  const recipe = await Recipe.findOne({ where: { organisationId: brewery.id, name: 'Ginger Lime Snap' } });
  if (!recipe) return;
  const version = recipe.currentVersion;
  await submit(developer, recipe.id, {
    version,
    message: 'Brighter with more lime; honey kept low for the 3 bar bottles.',
  });
  await approve(owner, recipe.id, { version, comment: 'For the December market run.', overrideReason: null });

  const first = await batches.startBatch(brewer, {
    recipeId: recipe.id,
    version,
    batch: { kind: 'bottles', value: 120 },
    trial: false,
  });
  await batches.addReading(brewer, first.id, {
    kind: 'ph',
    value: 3.2,
    tempC: 21,
    stage: 'base',
    source: null,
    takenAt: null,
    note: '',
    correctsId: null,
  });
  await batches.addIngredientLot(brewer, first.id, {
    ingredientId: null,
    ingredientName: 'Ginger root, raw',
    supplier: 'Marsh Lane Growers',
    supplierLot: 'MLG-2611-A',
    quantity: '1.4 kg',
    correctsId: null,
  });
  await batches.addIngredientLot(brewer, first.id, {
    ingredientId: null,
    ingredientName: 'Honey',
    supplier: 'Hollow Oak Apiary',
    supplierLot: 'HOA-0915',
    quantity: '120 g',
    correctsId: null,
  });
  for (const step of first.steps) await batches.signOffStep(brewer, first.id, step.number, '');
  await batches.addReading(brewer, first.id, {
    kind: 'gauge-pressure',
    value: 1.7,
    tempC: 22,
    stage: 'conditioning',
    source: null,
    takenAt: null,
    note: 'Test bottle 1 of 2',
    correctsId: null,
  });
  await batches.addReading(brewer, first.id, {
    kind: 'abv',
    value: 0.27,
    tempC: null,
    stage: 'finished',
    source: 'lab',
    takenAt: null,
    note: 'Lab sample sent on day 3',
    correctsId: null,
  });
  await batches.decide(owner, first.id, {
    decision: 'released',
    note: 'pH, pressure and alcohol all within limits.',
    overrideReason: null,
  });

  const second = await batches.startBatch(brewer, {
    recipeId: recipe.id,
    version,
    batch: { kind: 'bottles', value: 96 },
    trial: false,
  });
  await batches.addReading(brewer, second.id, {
    kind: 'ph',
    value: 3.3,
    tempC: 20,
    stage: 'base',
    source: null,
    takenAt: null,
    note: '',
    correctsId: null,
  });
  await batches.addIngredientLot(brewer, second.id, {
    ingredientId: null,
    ingredientName: 'Ginger root, raw',
    supplier: 'Marsh Lane Growers',
    supplierLot: 'MLG-2611-A',
    quantity: '1.1 kg',
    correctsId: null,
  });
  for (const step of second.steps.slice(0, -1)) await batches.signOffStep(brewer, second.id, step.number, '');
  await batches.addReading(brewer, second.id, {
    kind: 'gauge-pressure',
    value: 2.4,
    tempC: 22,
    stage: 'conditioning',
    source: null,
    takenAt: null,
    note: 'Warm corner of the room',
    correctsId: null,
  });
}
