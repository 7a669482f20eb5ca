import { AsyncLocalStorage } from 'node:async_hooks';
import fs from 'node:fs';
import path from 'node:path';

import pg from 'pg';
import { Op, Sequelize, Transaction } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';

import { config } from './config';
import { logger } from './logger';
import { migrations } from './migrations';
import { Attachment } from './models/attachment';
import { Batch } from './models/batch';
import { BatchDecision } from './models/batch-decision';
import { BatchDeviation } from './models/batch-deviation';
import { BatchIngredientLot } from './models/batch-ingredient-lot';
import { BatchReading } from './models/batch-reading';
import { BatchStepSignoff } from './models/batch-step-signoff';
import { BottleFormat } from './models/bottle-format';
import { Ingredient } from './models/ingredient';
import { IngredientChange } from './models/ingredient-change';
import { IngredientDisplayName } from './models/ingredient-display-name';
import { Invitation } from './models/invitation';
import { NutritionLabValue } from './models/nutrition-lab-value';
import { Organisation } from './models/organisation';
import { OutboxMessage } from './models/outbox-message';
import { PasswordReset } from './models/password-reset';
import { PendingSignUp } from './models/pending-sign-up';
import { Recipe } from './models/recipe';
import { RecipeReview } from './models/recipe-review';
import { RecipeVersion } from './models/recipe-version';
import { RevokedSession } from './models/revoked-session';
import { Tasting } from './models/tasting';
import { User } from './models/user';
import { forgetBrewery } from './services/brewery-cache';
import { forgetCachedUser } from './services/sessions';

export {
  Attachment,
  Batch,
  BatchDecision,
  BatchDeviation,
  BatchIngredientLot,
  BatchReading,
  BatchStepSignoff,
  BottleFormat,
  Ingredient,
  IngredientChange,
  IngredientDisplayName,
  Invitation,
  NutritionLabValue,
  Organisation,
  OutboxMessage,
  PasswordReset,
  PendingSignUp,
  Recipe,
  RecipeReview,
  RecipeVersion,
  RevokedSession,
  Tasting,
  User,
};

/** How long a connection waits for another one's write lock before SQLite gives up with SQLITE_BUSY. */
const BUSY_TIMEOUT_MS = 10_000;

interface SqliteHandle {
  configure(option: 'busyTimeout', ms: number): void;
  run(sql: string): void;
}

/** The database in use: PostgreSQL when DATABASE_URL is set, the SQLite file otherwise. */
export type Dialect = 'sqlite' | 'postgres';

function createSqlite(databasePath: string): Sequelize {
  if (databasePath !== ':memory:') fs.mkdirSync(path.dirname(databasePath), { recursive: true });
  const db = new Sequelize({
    dialect: 'sqlite',
    storage: databasePath,
    logging: false,
    // One connection: SQLite serialises writes anyway, and a single handle keeps PRAGMAs in force.
    pool: { max: 1, min: 1, idle: 60_000 },
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
  /*
   * Sequelize's SQLite dialect opens a new connection for every transaction and sets nothing on it but foreign keys.
   * Every connection it opens gets the busy timeout and the same journal settings here, so a write that meets another
   * one's lock waits for its turn instead of failing at once with SQLITE_BUSY.
   */
  const connections = db.connectionManager as unknown as {
    getConnection(options?: object): Promise<SqliteHandle>;
  };
  const openConnection = connections.getConnection.bind(connections);
  const configured = new WeakSet<SqliteHandle>();
  connections.getConnection = async (options?: object) => {
    const connection = await openConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      connection.run('PRAGMA foreign_keys = ON');
      connection.run('PRAGMA synchronous = NORMAL');
      configured.add(connection);
    }
    return connection;
  };
  return db;
}

/** Counts (`count(*)`, bigint) come back from node-postgres as text; every count here fits a JavaScript number. */
pg.types.setTypeParser(pg.types.builtins.INT8, (value: string) => Number(value));

/** The address each PostgreSQL Sequelize was made from: the migration lock takes a connection of its own. */
const postgresUrls = new WeakMap<Sequelize, string>();

/** A Sequelize for a PostgreSQL address. Also used by `db:copy` for its target. */
export function createPostgres(url: string, poolMax = config.databasePoolMax): Sequelize {
  const db = new Sequelize(url, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: poolMax, min: 0, idle: 10_000, acquire: 30_000 },
  });
  postgresUrls.set(db, url);
  return db;
}

export const sequelize = config.databaseUrl ? createPostgres(config.databaseUrl) : createSqlite(config.databasePath);

export const dialect = (): Dialect => (sequelize.getDialect() === 'postgres' ? 'postgres' : 'sqlite');

/** LIKE that ignores case on both databases (SQLite's LIKE already does for ASCII; PostgreSQL's needs ILIKE). */
export const likeOp = (): typeof Op.like | typeof Op.iLike => (dialect() === 'postgres' ? Op.iLike : Op.like);

/**
 * The key of PostgreSQL's transaction-level advisory lock every write transaction takes first: across all instances
 * sharing the database, one write transaction at a time, as SQLite's IMMEDIATE transactions give on one machine.
 * Checks made inside a transaction (stale versions, quotas, lot codes) therefore hold across instances.
 */
const WRITE_LOCK_KEY = 0x46697a7a; // "Fizz"

const inTurn = new AsyncLocalStorage<true>();
let lastTurn: Promise<unknown> = Promise.resolve();

/**
 * Runs a write transaction when its turn comes: one at a time in this process, in the order asked. SQLite lets one
 * writer in at a time anyway; queueing here means twenty people saving at once wait a few milliseconds each rather
 * than race for the lock. On PostgreSQL the transaction also takes a shared advisory lock, so the same holds across
 * instances. Use this, never `sequelize.transaction`, for every write transaction. Not re-entrant:
 * a transaction that starts another inside itself is a programming error and throws.
 */
export function transaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  if (inTurn.getStore())
    return Promise.reject(new Error('A write transaction cannot start another one inside itself.'));
  const locked =
    dialect() === 'postgres'
      ? async (t: Transaction) => {
          await sequelize.query('SELECT pg_advisory_xact_lock(:key)', {
            replacements: { key: WRITE_LOCK_KEY },
            transaction: t,
          });
          return work(t);
        }
      : work;
  const run = () => inTurn.run(true, () => sequelize.transaction(locked));
  const result = lastTurn.then(run, run);
  lastTurn = result.catch(() => undefined);
  return result;
}

for (const model of [
  Organisation,
  User,
  Invitation,
  PasswordReset,
  PendingSignUp,
  RevokedSession,
  OutboxMessage,
  BottleFormat,
  Ingredient,
  IngredientChange,
  IngredientDisplayName,
  Attachment,
  Recipe,
  RecipeVersion,
  Tasting,
  RecipeReview,
  Batch,
  BatchReading,
  BatchStepSignoff,
  BatchIngredientLot,
  BatchDeviation,
  BatchDecision,
  NutritionLabValue,
])
  model.initModel(sequelize);

Organisation.hasMany(User, { foreignKey: 'organisationId', as: 'users' });
User.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
Organisation.hasMany(Invitation, { foreignKey: 'organisationId', as: 'invitations' });
Invitation.belongsTo(Organisation, { foreignKey: 'organisationId', as: 'organisation' });
Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });
User.hasMany(PasswordReset, { foreignKey: 'userId', as: 'passwordResets' });
PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Organisation.hasMany(OutboxMessage, { foreignKey: 'organisationId', as: 'outboxMessages' });
OutboxMessage.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Organisation.hasMany(BottleFormat, { foreignKey: 'organisationId', as: 'bottleFormats' });
Organisation.hasMany(Ingredient, { foreignKey: 'organisationId', as: 'ingredients' });
Ingredient.hasMany(IngredientDisplayName, { foreignKey: 'ingredientId', as: 'displayNames' });
Organisation.hasMany(IngredientDisplayName, { foreignKey: 'organisationId', as: 'ingredientDisplayNames' });
Ingredient.hasMany(IngredientChange, { foreignKey: 'ingredientId', as: 'changeLog' });
IngredientChange.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Ingredient.hasMany(Attachment, { foreignKey: 'ingredientId', as: 'attachments' });
Organisation.hasMany(Attachment, { foreignKey: 'organisationId', as: 'attachments' });
Attachment.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
Organisation.hasMany(Recipe, { foreignKey: 'organisationId', as: 'recipes' });
Recipe.hasMany(RecipeVersion, { foreignKey: 'recipeId', as: 'versions' });
RecipeVersion.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
Recipe.hasMany(Tasting, { foreignKey: 'recipeId', as: 'tastings' });
Tasting.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Recipe.hasMany(RecipeReview, { foreignKey: 'recipeId', as: 'reviews' });
RecipeReview.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Organisation.hasMany(Batch, { foreignKey: 'organisationId', as: 'batches' });
Recipe.hasMany(Batch, { foreignKey: 'recipeId', as: 'batches' });
Batch.belongsTo(Recipe, { foreignKey: 'recipeId', as: 'recipe' });
Batch.belongsTo(User, { foreignKey: 'startedById', as: 'startedBy' });
Attachment.belongsTo(BatchReading, { foreignKey: 'batchReadingId', as: 'reading' });
BatchReading.belongsTo(User, { foreignKey: 'userId', as: 'user' });
BatchStepSignoff.belongsTo(User, { foreignKey: 'userId', as: 'user' });
BatchIngredientLot.belongsTo(User, { foreignKey: 'userId', as: 'user' });
BatchDeviation.belongsTo(User, { foreignKey: 'userId', as: 'user' });
BatchDecision.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Batch.hasMany(BatchReading, { foreignKey: 'batchId', as: 'readings' });
Batch.hasMany(BatchStepSignoff, { foreignKey: 'batchId', as: 'signoffs' });
Batch.hasMany(BatchIngredientLot, { foreignKey: 'batchId', as: 'ingredientLots' });
BatchIngredientLot.belongsTo(Batch, { foreignKey: 'batchId', as: 'batch' });
Batch.hasMany(BatchDeviation, { foreignKey: 'batchId', as: 'deviations' });
Batch.hasMany(BatchDecision, { foreignKey: 'batchId', as: 'decisions' });
Recipe.hasMany(NutritionLabValue, { foreignKey: 'recipeId', as: 'labValues' });
NutritionLabValue.belongsTo(User, { foreignKey: 'enteredById', as: 'enteredBy' });

// Any change to a user row (role, active, password) must reach the sign-in check at once.
User.addHook('afterSave', (user: User) => forgetCachedUser(user.id));
User.addHook('afterDestroy', (user: User) => forgetCachedUser(user.id));
User.addHook('afterBulkUpdate', () => forgetCachedUser());
// Likewise for what calculations read about a brewery: its alcohol limit and bottle formats.
Organisation.addHook('afterSave', (organisation: Organisation) => forgetBrewery(organisation.id));
Organisation.addHook('afterBulkUpdate', () => forgetBrewery());
BottleFormat.addHook('afterSave', (format: BottleFormat) => forgetBrewery(format.organisationId));
BottleFormat.addHook('afterBulkCreate', () => forgetBrewery());
BottleFormat.addHook('afterBulkUpdate', () => forgetBrewery());

/** Key of the advisory lock held while migrating, so instances starting together migrate one after the other. */
const MIGRATION_LOCK_KEY = 0x46697a6d; // "Fizm"

/**
 * Applies pending migrations to a database (this server's, or `db:copy`'s target). On PostgreSQL one instance
 * migrates at a time, holding an advisory lock on one connection of its own.
 */
export async function migrate(db: Sequelize): Promise<string[]> {
  const umzug = new Umzug({
    migrations,
    context: db.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize: db, tableName: 'schema_migrations' }),
    logger: undefined,
  });
  if (db.getDialect() !== 'postgres') return (await umzug.up()).map((m) => m.name);
  const client = new pg.Client({ connectionString: postgresUrls.get(db) });
  await client.connect();
  try {
    await client.query('SELECT pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    return (await umzug.up()).map((m) => m.name);
  } finally {
    await client.end();
  }
}

/** Opens the database, sets SQLite's safety and concurrency settings, and applies pending migrations. */
export async function prepareDatabase(): Promise<void> {
  if (dialect() === 'sqlite') {
    await sequelize.query('PRAGMA foreign_keys = ON');
    await sequelize.query('PRAGMA journal_mode = WAL');
    await sequelize.query(`PRAGMA busy_timeout = ${BUSY_TIMEOUT_MS}`);
    await sequelize.query('PRAGMA synchronous = NORMAL');
  }
  const applied = await migrate(sequelize);
  if (applied.length > 0) logger.info({ migrations: applied }, 'database migrated');
}

/** Answers whether the database responds; used by the health check. */
export async function databaseIsUp(): Promise<boolean> {
  try {
    await sequelize.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
