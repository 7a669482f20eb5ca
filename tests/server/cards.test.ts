import zlib from 'node:zlib';

import type { Express } from 'express';

import { cardCode, parseCardCode } from '@/lib/recipes/card';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';

import { addMember, type Agent, asBuffer, signUpOwner, startApp, stopApp } from './helpers';

let app: Express;
let owner: Agent;
let developer: Agent;
let brewer: Agent;
let recipeId: number;

/** The text a PDF shows: every content stream inflated, the hex strings of its TJ/Tj operators decoded. */
function pdfText(pdf: Buffer): string {
  const texts: string[] = [];
  for (const content of zlibStreams(pdf)) {
    for (const [, ops] of content.matchAll(/\[(.*?)\]\s*TJ/g)) {
      texts.push(
        [...ops.matchAll(/<([0-9a-fA-F]+)>/g)].map(([, hex]) => Buffer.from(hex, 'hex').toString('latin1')).join(''),
      );
    }
  }
  return texts.join('\n');
}

beforeAll(async () => {
  app = await startApp();
  await importDatasetIngredients(loadStarterIngredients());
  owner = (await signUpOwner(app)).agent;
  developer = (await addMember(app, owner, 'developer', 'Dev Eloper')).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
  const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
  const strawberry = (await owner.get('/api/ingredients').query({ q: 'strawberries raw' }).expect(200)).body.items.find(
    (i: { name: string }) => i.name === 'Strawberries, raw',
  ).id;
  const content = {
    baseBrew: {
      name: 'green tea base',
      residualSugarGPerL: 0.5,
      ph: 3.2,
      abvPercent: 0.05,
      residualCo2Volumes: null,
      lastOpenTempC: 21,
    },
    lines: [{ ingredientId: strawberry, amount: 40, unit: 'g-per-l', extractionPct: 50 }],
    sugars: [{ type: 'sucrose', gPerL: 1 }],
    process: {
      method: 'steep-strain',
      steepHours: 24,
      steepTempC: 4,
      strainLossPct: 10,
      carbonateHours: 48,
      carbonateTempC: 20,
      coldStoreTempC: 4,
    },
    bottleFormatId: formats.find((f) => f.name.includes('sparkling-wine'))!.id,
    targetVolumes: 2,
    sweetnessNote: '',
    highestTempC: 25,
  };
  recipeId = (await developer.post('/api/recipes').send({ name: 'Strawberry field', content }).expect(201)).body.id;
});
afterAll(stopApp);

describe('card codes', () => {
  it('carry recipe, version and batch, and read back', () => {
    expect(cardCode(12, 3, { kind: 'bottles', value: 150 })).toBe('12-3-b150');
    expect(parseCardCode('12-3-b150')).toEqual({ recipeId: 12, version: 3, batch: { kind: 'bottles', value: 150 } });
    expect(parseCardCode('12-3-l20.5')).toEqual({ recipeId: 12, version: 3, batch: { kind: 'litres', value: 20.5 } });
    expect(parseCardCode('nonsense')).toBeNull();
  });
});

describe('GET /api/recipes/:id/card', () => {
  it('marks a draft as not approved, and an approved version with who and when', async () => {
    const draft = await brewer.get(`/api/recipes/${recipeId}/card`).query({ kind: 'bottles', value: 100 }).expect(200);
    expect(draft.body).toMatchObject({
      recipeName: 'Strawberry field',
      version: 1,
      approval: null,
      bottles: 100,
      code: `${recipeId}-1-b100`,
    });
    await developer.post(`/api/recipes/${recipeId}/submit`).send({ version: 1 }).expect(200);
    await owner.post(`/api/recipes/${recipeId}/approve`).send({ version: 1 }).expect(200);
    const card = await brewer.get(`/api/recipes/${recipeId}/card`).query({ kind: 'bottles', value: 100 }).expect(200);
    expect(card.body.approval).toMatchObject({ by: 'Olwen Test', selfApproved: false });
    // 100 × 750 mL = 75 L; strawberries 40 g/L → 3000 g → 3.00 kg; sucrose 1 g/L → 75 g, under 100 g so to 0.1 g.
    // Steeped, so no per-bottle share; neither is more than 1 % off once rounded.
    expect(card.body.amounts).toEqual([
      { name: 'Strawberries', amount: '3.00 kg', perBottle: null, roundingNote: null },
      { name: 'Sucrose (table sugar)', amount: '75.0 g', perBottle: null, roundingNote: null },
    ]);
    expect(card.body.steps[0]).toMatch(/^Steep 3\.00 kg strawberries in 75\.0 L of green tea base at 4 °C for 24 h\.$/);
    const checkpoint = (label: string) =>
      card.body.checkpoints.find((c: { label: string }) => c.label === label)?.target as string;
    expect(checkpoint('pH of the base before flavouring')).toMatch(/^4\.2 or below/);
    // The test bottle's limit: 75 % of the sparkling-wine bottle's 6 bar rating = 4.50 bar (the caution line).
    expect(checkpoint('Gauge pressure of a test bottle')).toMatch(
      /^chill when it reads about \d\.\d\d bar \(\d+ psi\) at 20 °C; never above 4\.50 bar \(65 psi\)$/,
    );
    // After straining, by hand: 0.5 g/L residual in the base + the strawberries' sugar reaching the liquid, expected
    // case: 40 g/L × 4.89 g/100 g (USDA SR25 NDB 09316, sugars) × 50 % extraction = 0.978 g/L; 1.478 → "1.5 g/L";
    // 0.978 g/L ÷ 10 = "0.1 °Bx" above the base.
    expect(checkpoint('Sugar after straining')).toBe(
      "expected about 1.5 g/L of sugar, about 0.1 °Bx above the base's own reading",
    );
    expect(checkpoint('Bottles filled')).toBe('100 planned');
    expect(card.body.cautions.join(' ')).toMatch(/burst/);
    // In US units the steps read in °F: 4 °C = 39 °F (× 9/5 + 32 = 39.2).
    const us = await brewer
      .get(`/api/recipes/${recipeId}/card`)
      .query({ kind: 'bottles', value: 100, units: 'us' })
      .expect(200);
    expect(us.body.steps[0]).toMatch(/ at 39 °F for 24 h\.$/);
  });

  it('refuses a batch outside sensible limits with a message', async () => {
    const res = await brewer.get(`/api/recipes/${recipeId}/card`).query({ kind: 'litres', value: 0 }).expect(400);
    expect(res.body.error.fields.value).toBeDefined();
    const huge = await brewer.get(`/api/recipes/${recipeId}/card`).query({ kind: 'litres', value: 900000 }).expect(400);
    expect(huge.body.error.message).toMatch(/at most 20000 L/);
  });
});

describe('GET /api/recipes/:id/card.pdf', () => {
  it('is a PDF with the same content', async () => {
    const res = await brewer
      .get(`/api/recipes/${recipeId}/card.pdf`)
      .query({ kind: 'bottles', value: 100 })
      .buffer(true)
      .parse(asBuffer)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain('Strawberry field, version 1');
    expect(text).toContain('Approved for production by Olwen Test');
    expect(text).toContain('3.00 kg');
    expect(text).toContain('4.2 or below; never flavour above it');
    expect(text).toContain(`Card code ${recipeId}-1-b100`);
  });
});

describe('danger reaches the floor', () => {
  it('shows the worst finding, the rating against the worst case, and an approval over a danger finding with its reason, on the card and in the PDF', async () => {
    const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
    const crown = formats.find((f) => f.name === 'Glass crown cap 473 mL')!.id;
    // 4 g/L of sucrose in a 3 bar crown-cap bottle on a 35 °C day: over the rating (danger), under the alcohol limit.
    const content = {
      baseBrew: {
        name: 'black tea base',
        residualSugarGPerL: 0.5,
        ph: 3.2,
        abvPercent: 0.05,
        residualCo2Volumes: null,
        lastOpenTempC: 21,
      },
      lines: [],
      sugars: [{ type: 'sucrose', gPerL: 4 }],
      process: {
        method: 'in-bottle',
        steepHours: 0,
        steepTempC: 4,
        strainLossPct: 0,
        carbonateHours: 48,
        carbonateTempC: 20,
        coldStoreTempC: 4,
      },
      bottleFormatId: crown,
      targetVolumes: 2.5,
      sweetnessNote: '',
      highestTempC: 30,
    };
    const id = (await developer.post('/api/recipes').send({ name: 'Warm van risk', content }).expect(201)).body.id;
    await developer.post(`/api/recipes/${id}/submit`).send({ version: 1 }).expect(200);
    await owner
      .post(`/api/recipes/${id}/approve`)
      .send({ version: 1, comment: 'Chilled runs only', overrideReason: 'Delivered cold, kept cold' })
      .expect(200);

    const card = (await brewer.get(`/api/recipes/${id}/card`).query({ kind: 'bottles', value: 24 }).expect(200)).body;
    expect(card.safety.level).toBe('danger');
    expect(card.safety.headline).toMatch(/over the bottle's 3 bar rating/);
    expect(card.safety.rating).toMatch(/^Bottle rating 3\.00 bar .*; worst case .* at 35 °C\.$/);
    expect(card.approval).toMatchObject({ overrideReason: 'Delivered cold, kept cold', comment: 'Chilled runs only' });

    const res = await brewer
      .get(`/api/recipes/${id}/card.pdf`)
      .query({ kind: 'bottles', value: 24 })
      .buffer(true)
      .parse(asBuffer)
      .expect(200);
    const text = pdfText(res.body as Buffer);
    expect(text).toContain('Safety: DANGER.');
    expect(text).toContain('Approved over a danger finding. Reason: Delivered cold, kept cold');
    expect(text).toContain('Approval comment: Chilled runs only');
  });
});

describe('one page', () => {
  const pdfPages = (pdf: Buffer) => pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g)?.length ?? 0;
  // PDF user space is 1/72 in: A4 is 595.28 × 841.89 pt (ISO 216, 210 × 297 mm), US Letter 612 × 792 pt (8.5 × 11 in).
  const mediaBox = (pdf: Buffer) =>
    /\/MediaBox \[0 0 ([\d.]+) ([\d.]+)\]/.exec(pdf.toString('latin1'))!.slice(1).map(Number);
  const download = (agent: Agent, id: number, query: Record<string, string | number>) =>
    agent.get(`/api/recipes/${id}/card.pdf`).query(query).buffer(true).parse(asBuffer).expect(200);

  it('fits a recipe of 8 ingredient lines and 2 sugars on one A4 page and on one US Letter page, with write-in boxes', async () => {
    const formats = (await owner.get('/api/bottle-formats').expect(200)).body as { id: number; name: string }[];
    const names = [
      'Raspberries, raw',
      'Blackberries, raw',
      'Cherries, sour, red, raw',
      'Rhubarb, raw',
      'Ginger root, raw',
      'Spices, cardamom',
      'Cookies, shortbread, commercially prepared, plain',
      'Lemon juice, raw',
    ];
    const ids: number[] = [];
    for (const name of names) {
      const found = (
        await owner
          .get('/api/ingredients')
          .query({ q: name.split(',')[0], pageSize: 50 })
          .expect(200)
      ).body.items as { id: number; name: string }[];
      ids.push(found.find((i) => i.name === name)!.id);
    }
    const content = {
      baseBrew: {
        name: 'black tea base',
        residualSugarGPerL: 1,
        ph: 3.1,
        abvPercent: 0.05,
        residualCo2Volumes: null,
        lastOpenTempC: 21,
      },
      lines: ids.map((ingredientId) => ({ ingredientId, amount: 3, unit: 'g-per-l', extractionPct: 60 })),
      sugars: [
        { type: 'sucrose', gPerL: 2 },
        { type: 'honey', gPerL: 1 },
      ],
      process: {
        method: 'in-bottle',
        steepHours: 0,
        steepTempC: 4,
        strainLossPct: 0,
        carbonateHours: 48,
        carbonateTempC: 20,
        coldStoreTempC: 4,
      },
      bottleFormatId: formats.find((f) => f.name === 'Glass crown cap 473 mL')!.id,
      targetVolumes: 2.5,
      sweetnessNote: '',
      highestTempC: 30,
    };
    const id = (await developer.post('/api/recipes').send({ name: 'Eight-line medley', content }).expect(201)).body.id;
    const card = (await brewer.get(`/api/recipes/${id}/card`).query({ kind: 'bottles', value: 150 }).expect(200)).body;
    expect(card.amounts).toHaveLength(10);
    // In the bottle: 3 g/L × 0.473 L = 1.419 g of each fruit per bottle → "1.4 g"; 2 g/L sucrose → 0.946 → "0.9 g".
    expect(card.amounts[0]).toMatchObject({ name: 'Raspberries', perBottle: '1.4 g' });
    expect(card.amounts.find((a: { name: string }) => a.name.startsWith('Sucrose')).perBottle).toBe('0.9 g');

    const a4 = (await download(brewer, id, { kind: 'bottles', value: 150 })).body as Buffer;
    expect(pdfPages(a4)).toBe(1);
    expect(mediaBox(a4)).toEqual([595.28, 841.89]);
    const letter = (await download(brewer, id, { kind: 'bottles', value: 150, units: 'us' })).body as Buffer;
    expect(pdfPages(letter)).toBe(1);
    expect(mediaBox(letter)).toEqual([612, 792]);
    // Asked for A4 in US units, A4 it is.
    expect(
      mediaBox((await download(brewer, id, { kind: 'bottles', value: 150, units: 'us', paper: 'a4' })).body),
    ).toEqual([595.28, 841.89]);
    await brewer.get(`/api/recipes/${id}/card.pdf`).query({ kind: 'bottles', value: 150, paper: 'A3' }).expect(400);
    // Every checkpoint has its box: 24 pt high (8.47 mm, at least 8 mm) and 92 pt wide, drawn as "x y w h re".
    const drawn = [
      ...zlibStreams(a4)
        .join('\n')
        .matchAll(/([\d.]+) ([\d.]+) 92 24 re/g),
    ];
    expect(drawn).toHaveLength(card.checkpoints.length);
  });
});

/** Every content stream of a PDF, inflated. */
function zlibStreams(pdf: Buffer): string[] {
  const out: string[] = [];
  for (const [, body] of pdf.toString('latin1').matchAll(/stream\r?\n([\s\S]*?)\r?\nendstream/g)) {
    try {
      out.push(zlib.inflateSync(Buffer.from(body, 'latin1')).toString('latin1'));
    } catch {
      // not a deflated stream
    }
  }
  return out;
}
