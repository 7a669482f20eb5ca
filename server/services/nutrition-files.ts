import PDFDocument from 'pdfkit';
import sharp from 'sharp';

import { drawingSvg, type DrawItem, panelDrawing } from '@/lib/nutrition/drawing';
import { ALLERGEN_CAUTION, BASIS_NAMES, type BasisKey, type NutritionAnswer } from '@/lib/nutrition/panel';

/** The basis a file shows: the one asked for, else the lab's when there is one, else after conditioning. */
export const fileBasis = (answer: NutritionAnswer, asked?: BasisKey): BasisKey =>
  asked === 'lab' && !answer.lab ? answer.declared : (asked ?? answer.declared);

const FONT = { regular: 'Helvetica', bold: 'Helvetica-Bold' };

function drawItem(doc: PDFKit.PDFDocument, item: DrawItem, dx: number, dy: number) {
  if (item.kind === 'rule') {
    doc.rect(dx + item.x, dy + item.y, item.width, item.thickness).fill('#000');
    return;
  }
  const widthOf = (run: { text: string; bold?: boolean }) =>
    doc
      .font(run.bold ? FONT.bold : FONT.regular)
      .fontSize(item.size)
      .widthOfString(run.text);
  const total = item.runs.reduce((sum, run) => sum + widthOf(run), 0);
  let x = dx + (item.anchor === 'end' ? item.x - total : item.x);
  // The drawing's y is the baseline; pdfkit places text by its top, so lift it by the font's ascent.
  for (const run of item.runs) {
    doc.font(run.bold ? FONT.bold : FONT.regular).fontSize(item.size);
    doc.fillColor('#000').text(run.text, x, dy + item.y - item.size * 0.77, { lineBreak: false });
    x += widthOf(run);
  }
}

/**
 * The panel as a one-page PDF for a label designer: the panel at its size in points (it is drawn in the format of
 * 21 CFR 101.9(d)), then the allergen statement, what the values are based on, and the notes.
 */
export function nutritionPdf(answer: NutritionAnswer, key: BasisKey): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: 'LETTER',
    margins: { top: 36, bottom: 36, left: 36, right: 36 },
    info: { Title: `Nutrition panel: ${answer.recipeName} v${answer.version}` },
  });
  doc.font(FONT.bold).fontSize(14).text(`${answer.recipeName} · version ${answer.version}`);
  doc.font(FONT.regular).fontSize(10).text(`${BASIS_NAMES[key]} · ${answer.bottleName}`);
  const drawing = panelDrawing(answer, key);
  const top = doc.y + 10;
  const left = 36;
  doc.lineWidth(1).rect(left, top, drawing.width, drawing.height).stroke('#000');
  for (const item of drawing.items) drawItem(doc, item, left, top);
  doc.x = left;
  doc.y = top + drawing.height + 14;
  doc
    .font(FONT.bold)
    .fontSize(11)
    .text(answer.allergenStatement ?? 'No major food allergen in the ingredient library’s records.');
  doc.font(FONT.regular).fontSize(8).text(ALLERGEN_CAUTION, { width: 540 });
  doc.moveDown(0.6);
  doc
    .font(FONT.bold)
    .fontSize(9)
    .text(key === 'lab' ? 'Values from the lab, per the owner’s entry' : 'Estimate only');
  doc.font(FONT.regular).fontSize(8);
  for (const note of answer.notes) doc.text(`• ${note}`, { width: 540 });
  doc.end();
  return doc;
}

/** The panel as a PNG at three times its size in points (about 216 dots per inch), for a label designer. */
export async function nutritionPng(answer: NutritionAnswer, key: BasisKey): Promise<Buffer> {
  const svg = drawingSvg(panelDrawing(answer, key), 'Helvetica, Arial, DejaVu Sans, sans-serif', 3);
  return sharp(Buffer.from(svg)).png().toBuffer();
}
