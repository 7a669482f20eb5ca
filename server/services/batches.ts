import { Op, type Transaction, type WhereOptions } from 'sequelize';

import type {
  Attachment as AttachmentDto,
  BatchDecisionEntry,
  BatchDetail,
  BatchDeviationEntry,
  BatchIngredientLotEntry,
  BatchPage,
  BatchReadingEntry,
  BatchSummary,
  TraceHit,
} from '@/lib/api/types';
import { type BatchFacts, checkReading } from '@/lib/batches/checks';
import { parseQuantity } from '@/lib/batches/quantity';
import { standingDangers } from '@/lib/batches/standing';
import { can, rolesWith } from '@/lib/roles';
import type {
  BatchListQuery,
  DecisionInput,
  DeviationInput,
  IngredientLotInput,
  ReadingInput,
  StartBatchInput,
} from '@/lib/schemas/batches';
import {
  Attachment,
  Batch,
  BatchDecision,
  BatchDeviation,
  BatchIngredientLot,
  BatchReading,
  BatchStepSignoff,
  likeOp,
  Organisation,
  Recipe,
  transaction,
  User,
} from '@/server/db';
import { badRequest, forbidden, HttpError, notFound } from '@/server/errors';
import { mailer } from '@/server/mail/mailer';
import { batchDangerMail, batchWaitingMail } from '@/server/mail/templates';

import { storeFile, toAttachmentDto } from './attachments';
import { cachedAbvLimit, cachedBottleFormat, cachedWarmestTemp } from './brewery-cache';
import { recipeCard } from './cards';
import { displayNames, visibleIngredient } from './ingredients';
import { findOwnRecipe } from './own-recipe';
import { evaluate, getRecipe } from './recipes';
import type { AuthContext } from './sessions';

const conflict = (code: string, message: string) => new HttpError(409, code, message);
const name = (user: User | null | undefined) => user?.name ?? null;

function toSummary(batch: Batch, recipeName: string): BatchSummary {
  return {
    id: batch.id,
    lotCode: batch.lotCode,
    trial: batch.trial,
    state: batch.state,
    recipeId: batch.recipeId,
    recipeName,
    version: batch.versionNumber,
    batch: { kind: batch.batchKind, value: batch.batchValue },
    bottles: batch.frozen.card.bottles,
    startedBy: name(batch.startedBy),
    startedAt: batch.createdAt.toISOString(),
  };
}

/** A batch of the asking person's brewery, or 404 (another brewery's id answers like one that does not exist). */
async function ownBatch(auth: AuthContext, id: number, t?: Transaction): Promise<Batch> {
  const batch = await Batch.findOne({
    where: { id, organisationId: auth.organisationId },
    include: [
      { model: Recipe, as: 'recipe', attributes: ['id', 'name'] },
      { model: User, as: 'startedBy', attributes: ['name'] },
    ],
    transaction: t,
  });
  if (!batch) throw notFound('No such batch in your brewery.');
  return batch;
}

/** Who may record on a batch: production batches are the floor's (owners, brewers), trials the developers'. */
function assertCanRun(auth: AuthContext, batch: Batch): void {
  if (!can(auth.role, batch.trial ? 'batches.trial' : 'batches.run')) {
    throw forbidden(
      batch.trial
        ? 'Trial batches are run by owners and recipe developers.'
        : 'Production batches are run by owners and brewers.',
    );
  }
  if (batch.state === 'released' || batch.state === 'discarded') {
    throw conflict(
      'batch_closed',
      `This batch is ${batch.state}: its record is closed. Record a deviation on a new batch if something comes up.`,
    );
  }
}

/** The next lot code of the day: the brewery's prefix, the date (YYMMDD) and a two-digit sequence. */
async function nextLotCode(organisationId: number, t: Transaction): Promise<string> {
  const organisation = await Organisation.findByPk(organisationId, { attributes: ['lotPrefix'], transaction: t });
  const now = new Date();
  const day = `${String(now.getUTCFullYear()).slice(2)}${String(now.getUTCMonth() + 1).padStart(2, '0')}${String(now.getUTCDate()).padStart(2, '0')}`;
  const stem = `${organisation?.lotPrefix ?? 'LOT'}-${day}-`;
  const today = await Batch.findAll({
    where: { organisationId, lotCode: { [likeOp()]: `${stem}%` } },
    attributes: ['lotCode'],
    transaction: t,
  });
  const highest = today.reduce((max, b) => Math.max(max, Number(b.lotCode.slice(stem.length)) || 0), 0);
  return `${stem}${String(highest + 1).padStart(2, '0')}`;
}

/**
 * Starts a batch: a production batch needs the approved version, a trial any version. The card of that version at
 * that size (amounts, steps, checkpoints, safety, approval) and the facts its readings are judged by are frozen with it.
 */
export async function startBatch(auth: AuthContext, input: StartBatchInput): Promise<BatchDetail> {
  if (!can(auth.role, input.trial ? 'batches.trial' : 'batches.run')) {
    throw forbidden(
      input.trial
        ? 'Trial batches are started by owners and recipe developers.'
        : 'Production batches are started by owners and brewers.',
    );
  }
  const recipe = await findOwnRecipe(auth, input.recipeId, { active: true });
  if (input.version < 1 || input.version > recipe.currentVersion) {
    throw badRequest('No such version.', { version: `This recipe has versions 1 to ${recipe.currentVersion}.` });
  }
  if (!input.trial && recipe.approvedVersion !== input.version) {
    throw conflict(
      'not_approved',
      recipe.approvedVersion
        ? `Only the approved version (${recipe.approvedVersion}) can be made as a production batch. Start a trial to make version ${input.version}.`
        : 'No version of this recipe is approved for production yet. Start a trial, or ask an owner to approve a version.',
    );
  }
  const card = await recipeCard(auth, recipe.id, { version: input.version, batch: input.batch, units: 'metric' });
  const { content } = await getRecipe(auth, recipe.id, input.version);
  const [format, evaluation, abvLimitPercent, warmDayTempC] = await Promise.all([
    cachedBottleFormat(auth.organisationId, content.bottleFormatId),
    evaluate(auth, content),
    cachedAbvLimit(auth.organisationId),
    cachedWarmestTemp(auth.organisationId),
  ]);
  if (!format)
    throw badRequest('The recipe’s bottle format is missing.', { recipeId: 'Its bottle format no longer exists.' });
  const facts: BatchFacts = {
    liquidMl: format.liquidMl,
    headspaceMl: format.headspaceMl,
    sealedTempC: content.process.carbonateTempC,
    ratingBar: format.maxWorkingPressureBar,
    worstTotalCo2Volumes: evaluation.carbonation.cases.worst.co2.totalVolumes,
    abvLimitPercent,
    warmDayTempC,
  };
  const id = await transaction(async (t) => {
    const lotCode = await nextLotCode(auth.organisationId, t);
    const created = await Batch.create(
      {
        organisationId: auth.organisationId,
        recipeId: recipe.id,
        versionNumber: input.version,
        lotCode,
        trial: input.trial,
        state: 'in-progress',
        batchKind: input.batch.kind,
        batchValue: input.batch.value,
        frozen: { card: { ...card, code: lotCode }, facts },
        startedById: auth.userId,
      },
      { transaction: t },
    );
    return created.id;
  });
  return getBatch(auth, id);
}

export async function getBatch(auth: AuthContext, id: number): Promise<BatchDetail> {
  const batch = await ownBatch(auth, id);
  const who = { model: User, as: 'user', attributes: ['name'] };
  const order: [string, string][] = [['id', 'ASC']];
  const [readings, signoffs, lots, deviations, decisions] = await Promise.all([
    BatchReading.findAll({ where: { batchId: id }, include: [who], order }),
    BatchStepSignoff.findAll({ where: { batchId: id }, include: [who], order }),
    BatchIngredientLot.findAll({ where: { batchId: id }, include: [who], order }),
    BatchDeviation.findAll({ where: { batchId: id }, include: [who], order }),
    BatchDecision.findAll({ where: { batchId: id }, include: [who], order }),
  ]);
  const reports = readings.length
    ? await Attachment.findAll({
        where: { batchReadingId: readings.map((r) => r.id), organisationId: auth.organisationId },
        include: [{ model: User, as: 'uploadedBy', attributes: ['name'] }],
      })
    : [];
  const byStep = new Map(signoffs.map((s) => [s.stepNumber, s]));
  return {
    ...toSummary(batch, batch.recipe?.name ?? ''),
    card: batch.frozen.card,
    facts: batch.frozen.facts,
    readings: readings.map((r) =>
      toReadingEntry(r, reports.filter((a) => a.batchReadingId === r.id).map(toAttachmentDto)),
    ),
    steps: batch.frozen.card.steps.map((text, i) => {
      const s = byStep.get(i + 1);
      return {
        number: i + 1,
        text,
        signedOff: s ? { by: name(s.user), at: s.createdAt.toISOString(), note: s.note } : null,
      };
    }),
    ingredientLots: lots.map(toLotEntry),
    deviations: deviations.map(toDeviationEntry),
    decisions: decisions.map(toDecisionEntry),
    standingDangers: standingDangers(
      readings,
      deviations.map((d) => d.closesReadingId),
    ),
  };
}

function toReadingEntry(r: BatchReading, reports: AttachmentDto[]): BatchReadingEntry {
  return {
    id: r.id,
    kind: r.kind,
    value: r.value,
    tempC: r.tempC,
    stage: r.stage,
    source: r.source,
    takenAt: r.takenAt.toISOString(),
    note: r.note,
    check: {
      level: r.level,
      message: r.message,
      ...(r.predictedGaugeBar !== null ? { predictedGaugeBar: r.predictedGaugeBar } : {}),
    },
    correctsId: r.correctsId,
    by: name(r.user),
    reports,
  };
}

const toLotEntry = (l: BatchIngredientLot): BatchIngredientLotEntry => ({
  id: l.id,
  ingredientId: l.ingredientId,
  ingredientName: l.ingredientName,
  supplier: l.supplier,
  supplierLot: l.supplierLot,
  quantity: l.quantityText,
  quantityValue: l.quantityValue,
  quantityUnit: l.quantityUnit,
  correctsId: l.correctsId,
  by: name(l.user),
  at: l.createdAt.toISOString(),
});

const toDeviationEntry = (d: BatchDeviation): BatchDeviationEntry => ({
  id: d.id,
  whatHappened: d.whatHappened,
  actionTaken: d.actionTaken,
  closesReadingId: d.closesReadingId,
  correctsId: d.correctsId,
  by: name(d.user),
  at: d.createdAt.toISOString(),
});

const toDecisionEntry = (d: BatchDecision): BatchDecisionEntry => ({
  id: d.id,
  decision: d.decision,
  note: d.note,
  overrideReason: d.overrideReason,
  by: name(d.user),
  at: d.createdAt.toISOString(),
});

export async function listBatches(auth: AuthContext, query: BatchListQuery): Promise<BatchPage> {
  const where: WhereOptions<Batch> = {
    organisationId: auth.organisationId,
    ...(query.state !== 'all' ? { state: query.state } : {}),
    ...(query.recipeId ? { recipeId: query.recipeId } : {}),
    ...(query.lot ? { lotCode: { [likeOp()]: `%${query.lot.replace(/[%_\\]/g, '')}%` } } : {}),
  };
  const { rows, count } = await Batch.findAndCountAll({
    where,
    include: [
      { model: Recipe, as: 'recipe', attributes: ['name'] },
      { model: User, as: 'startedBy', attributes: ['name'] },
    ],
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return {
    items: rows.map((b) => toSummary(b, b.recipe?.name ?? '')),
    total: count,
    page: query.page,
    pageSize: query.pageSize,
  };
}

async function ownersToTell(organisationId: number, exceptUserId: number): Promise<User[]> {
  return User.findAll({
    where: {
      organisationId,
      role: [...rolesWith('batches.decide')],
      active: true,
      notifyReviews: true,
      id: { [Op.ne]: exceptUserId },
    },
  });
}

async function tell(auth: AuthContext, mail: { subject: string; text: string; html: string }): Promise<void> {
  for (const owner of await ownersToTell(auth.organisationId, auth.userId)) {
    await mailer.send({
      ...mail,
      to: owner.email,
      kind: 'batch',
      organisationId: auth.organisationId,
      userId: owner.id,
    });
  }
}

/** Records a reading and checks it at once; a danger tells the owners, an ABV at the limit holds the batch. */
export async function addReading(auth: AuthContext, id: number, input: ReadingInput): Promise<BatchReadingEntry> {
  const batch = await ownBatch(auth, id);
  assertCanRun(auth, batch);
  const check = checkReading({ kind: input.kind, value: input.value, tempC: input.tempC }, batch.frozen.facts);
  const reading = await transaction(async (t) => {
    if (
      input.correctsId &&
      !(await BatchReading.count({ where: { id: input.correctsId, batchId: id }, transaction: t }))
    ) {
      throw badRequest('No such reading on this batch.', { correctsId: 'No such reading on this batch.' });
    }
    const created = await BatchReading.create(
      {
        batchId: id,
        kind: input.kind,
        value: input.value,
        tempC: input.tempC ?? null,
        stage: input.stage,
        source: input.kind === 'abv' ? (input.source ?? 'in-house') : null,
        takenAt: input.takenAt ?? new Date(),
        note: input.note,
        level: check.level,
        message: check.message,
        predictedGaugeBar: check.predictedGaugeBar ?? null,
        correctsId: input.correctsId ?? null,
        userId: auth.userId,
      },
      { transaction: t },
    );
    if (input.kind === 'abv' && check.level === 'danger' && batch.state !== 'held') {
      await BatchDecision.create(
        {
          batchId: id,
          decision: 'held',
          note: `Held when ${input.value} % ABV was recorded: at or over the alcohol limit.`,
          overrideReason: null,
          userId: auth.userId,
        },
        { transaction: t },
      );
      await Batch.update({ state: 'held' }, { where: { id }, transaction: t });
    }
    return created;
  });
  if (check.level === 'danger') {
    const by = (await User.findByPk(auth.userId, { attributes: ['name'] }))?.name ?? 'Someone';
    await tell(
      auth,
      batchDangerMail({
        lotCode: batch.lotCode,
        recipeName: batch.recipe?.name ?? '',
        message: check.message,
        by,
        batchId: id,
      }),
    );
  }
  await reading.reload({ include: [{ model: User, as: 'user', attributes: ['name'] }] });
  return toReadingEntry(reading, []);
}

/** A lab's ABV report (PDF or image) kept with its reading through the attachment store. */
export async function addLabReport(
  auth: AuthContext,
  id: number,
  readingId: number,
  file: { buffer: Buffer; originalname: string } | undefined,
): Promise<AttachmentDto> {
  const batch = await ownBatch(auth, id);
  assertCanRun(auth, batch);
  const reading = await BatchReading.findOne({ where: { id: readingId, batchId: id } });
  if (!reading) throw notFound('No such reading on this batch.');
  if (reading.kind !== 'abv')
    throw badRequest('Reports go with ABV readings.', { file: 'Attach lab reports to an ABV reading.' });
  return storeFile(auth, { batchReadingId: reading.id }, file);
}

export async function signOffStep(
  auth: AuthContext,
  id: number,
  stepNumber: number,
  note: string,
): Promise<BatchDetail> {
  const batch = await ownBatch(auth, id);
  assertCanRun(auth, batch);
  const steps = batch.frozen.card.steps;
  if (stepNumber > steps.length) throw notFound(`This batch has ${steps.length} steps.`);
  const nowWaiting = await transaction(async (t) => {
    if (await BatchStepSignoff.count({ where: { batchId: id, stepNumber }, transaction: t })) {
      throw conflict('already_signed', `Step ${stepNumber} is already signed off.`);
    }
    await BatchStepSignoff.create({ batchId: id, stepNumber, note, userId: auth.userId }, { transaction: t });
    const signed = await BatchStepSignoff.count({ where: { batchId: id }, transaction: t });
    if (signed === steps.length) {
      const [moved] = await Batch.update(
        { state: 'awaiting-decision' },
        { where: { id, state: 'in-progress' }, transaction: t },
      );
      return moved === 1;
    }
    return false;
  });
  if (nowWaiting && !batch.trial)
    await tell(auth, batchWaitingMail({ lotCode: batch.lotCode, recipeName: batch.recipe?.name ?? '', batchId: id }));
  return getBatch(auth, id);
}

export async function addIngredientLot(
  auth: AuthContext,
  id: number,
  input: IngredientLotInput,
): Promise<BatchIngredientLotEntry> {
  const batch = await ownBatch(auth, id);
  assertCanRun(auth, batch);
  const quantity = parseQuantity(input.quantity);
  if (!quantity)
    throw badRequest('One field needs attention.', {
      quantity: 'Write a quantity with its unit, e.g. "2 kg", "5 lb" or "3 gal".',
    });
  const known = input.ingredientId ? await visibleIngredient(auth, input.ingredientId) : null;
  const ingredientName = known
    ? ((await displayNames(auth.organisationId, [known])).get(known.id) ?? known.name)
    : input.ingredientName;
  const created = await transaction(async (t) => {
    if (
      input.correctsId &&
      !(await BatchIngredientLot.count({ where: { id: input.correctsId, batchId: id }, transaction: t }))
    ) {
      throw badRequest('No such lot on this batch.', { correctsId: 'No such lot on this batch.' });
    }
    return BatchIngredientLot.create(
      {
        batchId: id,
        ingredientId: input.ingredientId ?? null,
        ingredientName,
        supplier: input.supplier,
        supplierLot: input.supplierLot,
        quantityText: input.quantity,
        quantityValue: quantity.value,
        quantityUnit: quantity.unit,
        correctsId: input.correctsId ?? null,
        userId: auth.userId,
      },
      { transaction: t },
    );
  });
  await created.reload({ include: [{ model: User, as: 'user', attributes: ['name'] }] });
  return toLotEntry(created);
}

export async function addDeviation(auth: AuthContext, id: number, input: DeviationInput): Promise<BatchDeviationEntry> {
  const batch = await ownBatch(auth, id);
  assertCanRun(auth, batch);
  const created = await transaction(async (t) => {
    if (
      input.closesReadingId &&
      !(await BatchReading.count({ where: { id: input.closesReadingId, batchId: id }, transaction: t }))
    ) {
      throw badRequest('No such reading on this batch.', { closesReadingId: 'No such reading on this batch.' });
    }
    if (
      input.correctsId &&
      !(await BatchDeviation.count({ where: { id: input.correctsId, batchId: id }, transaction: t }))
    ) {
      throw badRequest('No such entry on this batch.', { correctsId: 'No such entry on this batch.' });
    }
    return BatchDeviation.create(
      {
        batchId: id,
        whatHappened: input.whatHappened,
        actionTaken: input.actionTaken,
        closesReadingId: input.closesReadingId ?? null,
        correctsId: input.correctsId ?? null,
        userId: auth.userId,
      },
      { transaction: t },
    );
  });
  await created.reload({ include: [{ model: User, as: 'user', attributes: ['name'] }] });
  return toDeviationEntry(created);
}

/**
 * The owner's decision. A trial is never released; released and discarded are final; release is refused while a
 * danger reading stands unless the owner writes why (recorded with the decision).
 */
export async function decide(auth: AuthContext, id: number, input: DecisionInput): Promise<BatchDetail> {
  await transaction(async (t) => {
    const batch = await ownBatch(auth, id, t);
    if (batch.state === 'released' || batch.state === 'discarded')
      throw conflict('batch_closed', `This batch is already ${batch.state}.`);
    if (input.decision === 'released') {
      if (batch.trial) throw conflict('trial_batch', 'A trial batch is never released for sale. Hold or discard it.');
      const [readings, deviations] = await Promise.all([
        BatchReading.findAll({
          where: { batchId: id },
          attributes: ['id', 'kind', 'stage', 'level', 'correctsId'],
          transaction: t,
        }),
        BatchDeviation.findAll({ where: { batchId: id }, attributes: ['closesReadingId'], transaction: t }),
      ]);
      const standing = standingDangers(
        readings,
        deviations.map((d) => d.closesReadingId),
      );
      if (standing.length > 0 && !input.overrideReason) {
        throw new HttpError(
          409,
          'danger_standing',
          `${standing.length === 1 ? 'A danger reading stands' : `${standing.length} danger readings stand`}: record a later ok reading, close it with a deviation, or write why you release anyway.`,
          { overrideReason: 'Write why you release this batch despite the danger reading.' },
        );
      }
    }
    await BatchDecision.create(
      {
        batchId: id,
        decision: input.decision,
        note: input.note,
        overrideReason: input.overrideReason || null,
        userId: auth.userId,
      },
      { transaction: t },
    );
    await Batch.update({ state: input.decision }, { where: { id }, transaction: t });
  });
  return getBatch(auth, id);
}

/** Every batch of the brewery that used a supplier's lot (case as written, surrounding spaces ignored). */
export async function trace(auth: AuthContext, supplierLot: string): Promise<TraceHit[]> {
  const lots = await BatchIngredientLot.findAll({
    where: { supplierLot },
    include: [
      {
        model: Batch,
        as: 'batch',
        required: true,
        where: { organisationId: auth.organisationId },
        include: [
          { model: Recipe, as: 'recipe', attributes: ['name'] },
          { model: User, as: 'startedBy', attributes: ['name'] },
        ],
      },
      { model: User, as: 'user', attributes: ['name'] },
    ],
    order: [['id', 'DESC']],
  });
  return lots.map((l) => ({ batch: toSummary(l.batch!, l.batch!.recipe?.name ?? ''), lot: toLotEntry(l) }));
}

/** The batch a lot code names, as `/b/<lot code>` opens it. */
export async function findByLotCode(auth: AuthContext, lotCode: string): Promise<BatchSummary> {
  const batch = await Batch.findOne({
    where: { organisationId: auth.organisationId, lotCode: lotCode.toUpperCase() },
    include: [
      { model: Recipe, as: 'recipe', attributes: ['name'] },
      { model: User, as: 'startedBy', attributes: ['name'] },
    ],
  });
  if (!batch) throw notFound('No batch with this lot code in your brewery.');
  return toSummary(batch, batch.recipe?.name ?? '');
}
