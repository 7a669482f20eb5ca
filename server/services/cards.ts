import PDFDocument from 'pdfkit';

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

/**
 * The same card as a PDF (A4; it also fits US Letter's width). Standard Helvetica covers the text we print
 * (Latin-1, the degree sign); the amounts are set large for reading at arm's length.
 */
export function cardPdf(card: RecipeCard, options: { compress?: boolean } = {}): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: 40, bottom: 40, left: 48, right: 48 },
    compress: options.compress ?? true,
    info: { Title: `${card.recipeName} v${card.version}`, Author: card.brewery },
  });
  const heading = (text: string) =>
    doc.moveDown(0.6).font('Helvetica-Bold').fontSize(13).text(text).moveDown(0.2).font('Helvetica').fontSize(11);
  doc.font('Helvetica').fontSize(10).text(card.brewery);
  doc.font('Helvetica-Bold').fontSize(22).text(`${card.recipeName}, version ${card.version}`);
  doc.font('Helvetica').fontSize(11);
  doc.text(
    card.approval
      ? `Approved for production by ${card.approval.by ?? 'an owner'} on ${card.approval.at.slice(0, 10)}${card.approval.selfApproved ? ' (the brewery\u2019s only owner, who also submitted it)' : ''}.`
      : 'NOT APPROVED FOR PRODUCTION: development version.',
  );
  const level = { ok: 'OK', caution: 'CAUTION', danger: 'DANGER' }[card.safety.level];
  doc.font('Helvetica-Bold').text(`Safety: ${level}. ${card.safety.headline}`).font('Helvetica');
  doc.text(card.safety.rating);
  if (card.approval?.overrideReason)
    doc
      .font('Helvetica-Bold')
      .text(`Approved over a danger finding. Reason: ${card.approval.overrideReason}`)
      .font('Helvetica');
  if (card.approval?.comment) doc.text(`Approval comment: ${card.approval.comment}`);
  doc.text(`Batch: ${card.batch}.`);
  doc.text(`Base: ${card.base}.`);
  heading('Amounts');
  for (const a of card.amounts)
    doc
      .font('Helvetica-Bold')
      .fontSize(15)
      .text(`${a.amount}  `, { continued: true })
      .font('Helvetica')
      .fontSize(13)
      .text(a.name);
  heading('Steps');
  card.steps.forEach((step, i) => doc.text(`${i + 1}. ${step}`));
  heading('Checkpoints');
  for (const c of card.checkpoints) doc.text(c);
  heading('Key numbers');
  for (const k of card.keyNumbers) doc.text(`${k.label}: ${k.value}`);
  heading('Allergens');
  doc.text(
    card.allergens.length ? card.allergens.join(', ') : 'None of the major allergens recorded for these ingredients.',
  );
  heading('Cautions');
  for (const c of card.cautions) doc.fontSize(10).text(`- ${c}`);
  doc.moveDown().fontSize(10).text(`Card code ${card.code}: open it in Fizzwright at /c/${card.code}`);
  doc.end();
  return doc;
}
