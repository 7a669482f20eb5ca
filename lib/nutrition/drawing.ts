import { type BasisKey, basisOf, DV_FOOTNOTE, type NutritionAnswer, panelLines } from './panel';

/** A run of text inside one line: runs flow one after another, bold or not. */
export interface Run {
  text: string;
  bold?: boolean;
}
export type DrawItem =
  | { kind: 'text'; x: number; y: number; size: number; runs: Run[]; anchor: 'start' | 'end' }
  | { kind: 'rule'; x: number; y: number; width: number; thickness: number };

export interface Drawing {
  width: number;
  height: number;
  items: DrawItem[];
}

const PAD = 6;
const LINE = 13;
const INDENT = 10;

/** Splits `text` into lines of at most `chars` characters, at spaces. */
function wrap(text: string, chars: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line && `${line} ${word}`.length > chars) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) lines.push(line);
  return lines;
}

/**
 * The panel of one basis laid out in points, black on white, in the format of 21 CFR 101.9(d): the title, servings
 * and serving size, a heavy bar, calories in large type, the nutrients with hairlines between them and the vitamins
 * and minerals below a heavy bar, then the footnote; two columns (per serving, per container) where 101.9(b)(12)(i)
 * asks for them. The PDF and the PNG both draw this, so they cannot disagree.
 */
export function panelDrawing(answer: NutritionAnswer, key: BasisKey): Drawing {
  const { basis, perContainer } = basisOf(answer, key);
  const dual = perContainer !== undefined;
  const width = dual ? 380 : 260;
  const right = width - PAD;
  const inner = width - 2 * PAD;
  const items: DrawItem[] = [];
  let y = PAD;
  const text = (x: number, size: number, runs: Run[], anchor: 'start' | 'end' = 'start') =>
    items.push({ kind: 'text', x, y, size, runs, anchor });
  const rule = (thickness: number) => {
    items.push({ kind: 'rule', x: PAD, y, width: inner, thickness });
    y += thickness;
  };

  y += 26;
  text(PAD, 28, [{ text: 'Nutrition Facts', bold: true }]);
  y += 5;
  rule(0.5);
  y += 13;
  text(PAD, 11, [{ text: answer.serving.servingsText }]);
  y += 16;
  text(PAD, 12, [{ text: 'Serving size', bold: true }]);
  text(right, 12, [{ text: `${answer.serving.household} (${answer.serving.metric})`, bold: true }], 'end');
  y += 5;
  rule(9);

  // Columns of a two-column panel: amount and %DV per serving, then per container.
  const columns = dual ? [PAD + 140, PAD + 262] : [];
  const columnRight = dual ? [PAD + 248, right] : [right];
  if (dual) {
    y += 12;
    text(columns[0], 9, [{ text: 'Per serving', bold: true }]);
    text(columns[1], 9, [{ text: 'Per container', bold: true }]);
    y += 3;
    rule(0.5);
  } else {
    y += 11;
    text(PAD, 9, [{ text: 'Amount per serving', bold: true }]);
  }
  y += 22;
  text(PAD, 20, [{ text: 'Calories', bold: true }]);
  if (dual) {
    text(columnRight[0], 22, [{ text: basis.label.calories, bold: true }], 'end');
    text(columnRight[1], 22, [{ text: perContainer.label.calories, bold: true }], 'end');
  } else text(right, 28, [{ text: basis.label.calories, bold: true }], 'end');
  y += 5;
  rule(4.5);
  y += 11;
  if (dual) {
    text(columnRight[0], 8, [{ text: '% DV*', bold: true }], 'end');
    text(columnRight[1], 8, [{ text: '% DV*', bold: true }], 'end');
  } else text(right, 9, [{ text: '% Daily Value*', bold: true }], 'end');
  y += 3;

  for (const line of panelLines(basis, perContainer)) {
    if (line.thickRuleAbove) rule(9);
    else rule(0.5);
    y += LINE - 2;
    const x = PAD + line.indent * INDENT;
    if (dual) {
      const name = line.nutrient === 'addedSugars' ? 'Added Sugars' : line.name;
      text(x, 10, [{ text: name, bold: line.bold }]);
      const amounts = [
        { amount: line.nutrient === 'addedSugars' ? basis.label.addedSugars : line.amount, dv: line.dv },
        {
          amount: line.nutrient === 'addedSugars' ? perContainer.label.addedSugars : line.perContainer!.amount,
          dv: line.perContainer!.dv,
        },
      ];
      amounts.forEach((a, i) => {
        text(columns[i], 10, [{ text: a.amount }]);
        if (a.dv !== null) text(columnRight[i], 10, [{ text: a.dv, bold: true }], 'end');
      });
    } else {
      text(x, 10, [{ text: line.name, bold: line.bold }, ...(line.amount ? [{ text: ` ${line.amount}` }] : [])]);
      if (line.dv !== null) text(right, 10, [{ text: line.dv, bold: true }], 'end');
    }
    y += 4;
  }
  rule(4.5);
  y += 2;
  for (const part of wrap(DV_FOOTNOTE, dual ? 86 : 58)) {
    y += 9;
    text(PAD, 7.5, [{ text: part }]);
  }
  y += PAD;
  return { width, height: Math.ceil(y), items };
}

const escapeXml = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** The drawing as SVG (black on white, a 1 pt frame), `scale` times its size in points. */
export function drawingSvg(drawing: Drawing, fontFamily: string, scale = 1): string {
  const body = drawing.items
    .map((item) => {
      if (item.kind === 'rule')
        return `<rect x="${item.x}" y="${item.y}" width="${item.width}" height="${item.thickness}" fill="#000"/>`;
      const runs = item.runs
        .map((r) => `<tspan font-weight="${r.bold ? 700 : 400}">${escapeXml(r.text)}</tspan>`)
        .join('');
      return `<text xml:space="preserve" x="${item.x}" y="${item.y}" font-size="${item.size}" text-anchor="${item.anchor}">${runs}</text>`;
    })
    .join('');
  const w = drawing.width;
  const h = drawing.height;
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w * scale}" height="${h * scale}" viewBox="0 0 ${w} ${h}">` +
    `<rect x="0" y="0" width="${w}" height="${h}" fill="#fff"/>` +
    `<rect x="0.5" y="0.5" width="${w - 1}" height="${h - 1}" fill="none" stroke="#000" stroke-width="1"/>` +
    `<g font-family="${escapeXml(fontFamily)}" fill="#000">${body}</g></svg>`
  );
}
