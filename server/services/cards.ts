import PDFDocument from 'pdfkit';

import { formatDate } from '@/lib/format';
import { buildCard, type RecipeCard } from '@/lib/recipes/card';
import type { BatchSize } from '@/lib/recipes/scaling';
import type { UnitSystem } from '@/lib/units';
import { Organisation, RecipeReview, User } from '@/server/db';

import { evaluate, getRecipe, scale } from './recipes';
import type { AuthContext } from './sessions';

/** The card of a recipe version at a batch size: approved versions carry who approved them and when. */
export async function recipeCard(
  auth: AuthContext,
  id: number,
  query: { version?: number | null; batch: BatchSize; units: UnitSystem },
): Promise<RecipeCard> {
  const recipe = await getRecipe(auth, id, query.version ?? undefined);
  const [scaled, evaluation, organisation, approval] = await Promise.all([
    scale(auth, id, { batch: query.batch, units: query.units, version: recipe.version }),
    evaluate(auth, recipe.content, { forReview: true }),
    Organisation.findByPk(auth.organisationId, { attributes: ['name'] }),
    recipe.approvedVersion === recipe.version
      ? RecipeReview.findOne({
          where: { recipeId: id, versionNumber: recipe.version, action: 'approved' },
          include: [{ model: User, as: 'user', attributes: ['name'] }],
          order: [['id', 'DESC']],
        })
      : null,
  ]);
  return buildCard({
    brewery: organisation?.name ?? '',
    recipeId: id,
    recipeName: recipe.name,
    version: recipe.version,
    content: recipe.content,
    scaled,
    bottleName: scaled.bottleName,
    bottleLiquidMl: scaled.bottleLiquidMl,
    evaluation,
    approval: approval
      ? {
          by: approval.user?.name ?? null,
          at: approval.createdAt.toISOString(),
          selfApproved: approval.selfApproved,
          comment: approval.comment,
          overrideReason: approval.overrideReason,
        }
      : null,
    batch: query.batch,
    units: query.units,
  });
}

/** Paper the card PDF is laid out for. */
export type Paper = 'a4' | 'letter';

const PAPER_SIZE: Record<Paper, 'A4' | 'LETTER'> = { a4: 'A4', letter: 'LETTER' };
/** A write-in box, pt: 24 pt is 8.5 mm high, room for a pen. */
const BOX = { width: 92, height: 24 };
const MARGIN = 36;
const GAP = 18;

/**
 * The same card as a one-page PDF on A4 or US Letter: a header, the safety box, then two columns (amounts and
 * checkpoints with write-in boxes; steps, key numbers and allergens), and the cautions across the foot. The layout
 * is measured first and the type made smaller until it fits one page (down to 70 %). Standard Helvetica covers the
 * text we print (Latin-1, the degree sign).
 */
export function cardPdf(
  card: RecipeCard,
  options: { compress?: boolean; paper?: Paper; locale?: string } = {},
): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: PAPER_SIZE[options.paper ?? 'a4'],
    margins: { top: MARGIN, bottom: MARGIN, left: MARGIN, right: MARGIN },
    compress: options.compress ?? true,
    info: { Title: `${card.recipeName} v${card.version}`, Author: card.brewery },
  });
  const bottom = doc.page.height - MARGIN;
  let scale = 1;
  for (; scale > 0.7; scale -= 0.05) if (layoutCard(doc, card, scale, false, options.locale) <= bottom) break;
  layoutCard(doc, card, scale, true, options.locale);
  doc.end();
  return doc;
}

/** Lays the card out at a type scale; draws it only when asked. Returns where the last line ends. */
function layoutCard(doc: PDFKit.PDFDocument, card: RecipeCard, scale: number, draw: boolean, locale?: string): number {
  const left = MARGIN;
  const width = doc.page.width - 2 * MARGIN;
  const columnWidth = (width - GAP) / 2;
  const block = (text: string, x: number, y: number, w: number, font: string, size: number, gap = 1) => {
    doc.font(font).fontSize(size * scale);
    const h = doc.heightOfString(text, { width: w, lineGap: gap });
    if (draw) doc.text(text, x, y, { width: w, lineGap: gap });
    return h;
  };
  const heading = (text: string, x: number, y: number) =>
    y + block(text, x, y, columnWidth, 'Helvetica-Bold', 12.5) + 3;

  let y = MARGIN;
  y += block(card.brewery, left, y, width, 'Helvetica', 9);
  y += block(`${card.recipeName}, version ${card.version}`, left, y, width, 'Helvetica-Bold', 19);
  y += block(
    card.approval
      ? `Approved for production by ${card.approval.by ?? 'an owner'} on ${formatDate(card.approval.at, locale)}${card.approval.selfApproved ? ' (the brewery\u2019s only owner, who also submitted it)' : ''}.`
      : 'NOT APPROVED FOR PRODUCTION: development version.',
    left,
    y,
    width,
    card.approval ? 'Helvetica' : 'Helvetica-Bold',
    10.5,
  );
  y += 6;

  // The safety box: the level in words and a heavier border when it is not OK (never colour alone).
  const level = { ok: 'OK', caution: 'CAUTION', danger: 'DANGER' }[card.safety.level];
  const inner = width - 12;
  const top = y;
  y += 6;
  y += block(`Safety: ${level}. ${card.safety.headline}`, left + 6, y, inner, 'Helvetica-Bold', 10);
  y += block(card.safety.rating, left + 6, y, inner, 'Helvetica', 10);
  if (card.approval?.overrideReason)
    y += block(
      `Approved over a danger finding. Reason: ${card.approval.overrideReason}`,
      left + 6,
      y,
      inner,
      'Helvetica-Bold',
      10,
    );
  if (card.approval?.comment)
    y += block(`Approval comment: ${card.approval.comment}`, left + 6, y, inner, 'Helvetica', 10);
  y += 5;
  if (draw)
    doc
      .lineWidth(card.safety.level === 'ok' ? 1 : 2.5)
      .rect(left, top, width, y - top)
      .stroke();
  y += 6;
  y += block(`Batch: ${card.batch}. Base: ${card.base}.`, left, y, width, 'Helvetica', 10.5);
  y += 8;

  // Left column: amounts, then checkpoints with write-in boxes.
  const x1 = left;
  let y1 = heading('Amounts', x1, y);
  const amountWidth = 78 * scale;
  for (const a of card.amounts) {
    const hAmount = block(a.amount, x1, y1, amountWidth, 'Helvetica-Bold', 13);
    const textX = x1 + amountWidth + 6;
    const textW = columnWidth - amountWidth - 6;
    let h = block(a.name, textX, y1 + 1, textW, 'Helvetica', 11);
    if (a.perBottle) h += block(`${a.perBottle} into each bottle`, textX, y1 + 1 + h, textW, 'Helvetica', 9);
    if (a.roundingNote) h += block(a.roundingNote, textX, y1 + 1 + h, textW, 'Helvetica-Bold', 8.5);
    y1 += Math.max(hAmount, h + 1) + 4;
  }
  y1 = heading('Checkpoints', x1, y1 + 6);
  for (const c of card.checkpoints) {
    const textW = columnWidth - BOX.width - 8;
    let h = block(c.label, x1, y1, textW, 'Helvetica-Bold', 10);
    if (c.target) h += block(c.target, x1, y1 + h, textW, 'Helvetica', 8.5);
    const rowH = Math.max(h, BOX.height);
    if (draw)
      doc
        .lineWidth(1)
        .rect(x1 + columnWidth - BOX.width, y1 + (rowH - BOX.height) / 2, BOX.width, BOX.height)
        .stroke();
    y1 += rowH + 6;
  }

  // Right column: steps, key numbers, allergens.
  const x2 = left + columnWidth + GAP;
  let y2 = heading('Steps', x2, y);
  card.steps.forEach((step, i) => {
    y2 += block(`${i + 1}. ${step}`, x2, y2, columnWidth, 'Helvetica', 10) + 4;
  });
  y2 = heading('Key numbers', x2, y2 + 6);
  for (const k of card.keyNumbers) y2 += block(`${k.label}: ${k.value}`, x2, y2, columnWidth, 'Helvetica', 9.5) + 3;
  y2 = heading('Allergens', x2, y2 + 6);
  y2 += block(
    card.allergens.length ? card.allergens.join(', ') : 'None of the major allergens recorded for these ingredients.',
    x2,
    y2,
    columnWidth,
    'Helvetica',
    10,
  );

  // Across the foot: the cautions and the card code.
  y = Math.max(y1, y2) + 8;
  if (draw)
    doc
      .lineWidth(0.5)
      .moveTo(left, y)
      .lineTo(left + width, y)
      .stroke();
  y += 5;
  for (const c of card.cautions) y += block(`- ${c}`, left, y, width, 'Helvetica', 8.5);
  y += 4;
  y += block(`Card code ${card.code}: open it in Fizzwright at /c/${card.code}`, left, y, width, 'Helvetica', 8.5);
  return y;
}
