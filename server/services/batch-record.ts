import PDFDocument from 'pdfkit';

import type { BatchDetail } from '@/lib/api/types';
import { formatDateTime } from '@/lib/format';
import { BATCH_STATE_LABELS, READING_KIND_LABELS, READING_UNITS, STAGE_LABELS } from '@/lib/schemas/batches';

/**
 * The batch record as a PDF, from the same model the batch screen shows: lot code, state and decision, the frozen
 * amounts, the steps with who signed them, every reading with its check, the ingredient lots and the deviations.
 */
export function batchRecordPdf(
  batch: BatchDetail,
  options: { compress?: boolean; locale?: string } = {},
): PDFKit.PDFDocument {
  const when = (iso: string) => formatDateTime(iso, options.locale);
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: 40, bottom: 40, left: 48, right: 48 },
    compress: options.compress ?? true,
    info: { Title: `Batch ${batch.lotCode}`, Author: batch.card.brewery },
  });
  const heading = (text: string) =>
    doc.moveDown(0.6).font('Helvetica-Bold').fontSize(13).text(text).moveDown(0.2).font('Helvetica').fontSize(10);
  doc.font('Helvetica').fontSize(10).text(batch.card.brewery);
  doc
    .font('Helvetica-Bold')
    .fontSize(20)
    .text(`Batch ${batch.lotCode}${batch.trial ? ' (TRIAL: not for sale)' : ''}`);
  doc.font('Helvetica').fontSize(11).text(`${batch.recipeName}, version ${batch.version}. ${batch.card.batch}.`);
  doc.text(
    `State: ${BATCH_STATE_LABELS[batch.state]}. Started ${when(batch.startedAt)} by ${batch.startedBy ?? 'someone'}.`,
  );
  const safety = { ok: 'OK', caution: 'CAUTION', danger: 'DANGER' }[batch.card.safety.level];
  doc.font('Helvetica-Bold').text(`Recipe safety: ${safety}. ${batch.card.safety.headline}`).font('Helvetica');
  if (batch.standingDangers.length > 0)
    doc.font('Helvetica-Bold').text(`Danger readings standing: ${batch.standingDangers.length}.`).font('Helvetica');

  heading('Amounts');
  for (const a of batch.card.amounts) doc.text(`${a.amount}  ${a.name}`);
  heading('Steps');
  for (const s of batch.steps) {
    doc.text(`${s.number}. ${s.text}`);
    doc
      .fillColor('#444444')
      .text(
        s.signedOff
          ? `   Signed off by ${s.signedOff.by ?? 'someone'}, ${when(s.signedOff.at)}${s.signedOff.note ? `: ${s.signedOff.note}` : ''}`
          : '   Not signed off.',
      )
      .fillColor('#000000');
  }
  heading('Readings');
  if (batch.readings.length === 0) doc.text('None recorded.');
  for (const r of batch.readings) {
    const unit = READING_UNITS[r.kind] ? ` ${READING_UNITS[r.kind]}` : '';
    doc.text(
      `${when(r.takenAt)}  ${STAGE_LABELS[r.stage]}  ${READING_KIND_LABELS[r.kind]} ${r.value}${unit}${r.tempC !== null ? ` at ${r.tempC} °C` : ''}${r.source ? ` (${r.source})` : ''}  by ${r.by ?? 'someone'}${r.correctsId ? `  corrects #${r.correctsId}` : ''}`,
    );
    doc
      .fillColor('#444444')
      .text(
        `   #${r.id} ${r.check.level.toUpperCase()}: ${r.check.message}${r.reports.length ? ` Lab report: ${r.reports.map((f) => f.name).join(', ')}.` : ''}`,
      )
      .fillColor('#000000');
  }
  heading('Ingredient lots');
  if (batch.ingredientLots.length === 0) doc.text('None recorded.');
  for (const l of batch.ingredientLots)
    doc.text(
      `${l.ingredientName}: ${l.quantity}, lot ${l.supplierLot}${l.supplier ? ` from ${l.supplier}` : ''}  (${l.by ?? 'someone'}, ${when(l.at)})`,
    );
  heading('Deviations');
  if (batch.deviations.length === 0) doc.text('None recorded.');
  for (const d of batch.deviations)
    doc.text(
      `${when(d.at)} ${d.by ?? 'someone'}: ${d.whatHappened} Done: ${d.actionTaken}${d.closesReadingId ? ` (closes reading #${d.closesReadingId})` : ''}`,
    );
  heading('Decisions');
  if (batch.decisions.length === 0) doc.text('No decision yet.');
  for (const d of batch.decisions) {
    doc.text(`${when(d.at)} ${d.by ?? 'someone'}: ${BATCH_STATE_LABELS[d.decision]}.${d.note ? ` ${d.note}` : ''}`);
    if (d.overrideReason)
      doc
        .font('Helvetica-Bold')
        .text(`   Released over a danger reading. Reason: ${d.overrideReason}`)
        .font('Helvetica');
  }
  doc.end();
  return doc;
}
