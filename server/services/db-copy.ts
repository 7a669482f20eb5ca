import { GetObjectCommand, PutObjectCommand, type S3Client } from '@aws-sdk/client-s3';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

import { migrate } from '@/server/db';

import { bucketHas } from './object-store';

/** Tables a copy leaves out: the migration record (each database keeps its own) and rate-limit counters. */
const NOT_COPIED = new Set(['schema_migrations', 'rate_limit_hits']);
/** Rows per INSERT statement. */
const CHUNK = 500;

interface TablePlan {
  name: string;
  key: string;
  /** Columns both databases have (the target's own search column is left to its trigger). */
  columns: string[];
  /** Foreign-key columns pointing at a table copied later (or at itself): written after every table is in. */
  deferred: string[];
  /** Whether the key comes from a sequence to move past the copied ids. */
  serial: boolean;
}

export interface CopyCount {
  table: string;
  source: number;
  target: number;
}

export class CopyRefused extends Error {}

const q = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** The target's tables in an order where every foreign key points at a table already copied (cycles deferred). */
async function plan(source: Sequelize, target: Sequelize): Promise<TablePlan[]> {
  const tables =
    // pg_tables rather than information_schema.tables: Sequelize takes a query of the latter for its own table list.
    (
      await target.query<{ name: string }>("SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public'", {
        type: QueryTypes.SELECT,
      })
    )
      .map((t) => t.name)
      .filter((t) => !NOT_COPIED.has(t));
  const references = await target.query<{
    table_name: string;
    column_name: string;
    foreign_table: string;
    nullable: boolean;
  }>(
    `SELECT kcu.table_name, kcu.column_name, ccu.table_name AS foreign_table, (c.is_nullable = 'YES') AS nullable
       FROM information_schema.table_constraints tc
       JOIN information_schema.key_column_usage kcu ON kcu.constraint_name = tc.constraint_name AND kcu.table_schema = tc.table_schema
       JOIN information_schema.constraint_column_usage ccu ON ccu.constraint_name = tc.constraint_name AND ccu.table_schema = tc.table_schema
       JOIN information_schema.columns c ON c.table_name = kcu.table_name AND c.column_name = kcu.column_name AND c.table_schema = kcu.table_schema
      WHERE tc.constraint_type = 'FOREIGN KEY' AND tc.table_schema = 'public'`,
    { type: QueryTypes.SELECT },
  );
  const keys = await target.query<{ table_name: string; column_name: string; is_serial: boolean }>(
    `SELECT kcu.table_name, kcu.column_name, (c.column_default LIKE 'nextval%') AS is_serial
       FROM information_schema.table_constraints tc
       JOIN information_schema.key_column_usage kcu ON kcu.constraint_name = tc.constraint_name AND kcu.table_schema = tc.table_schema
       JOIN information_schema.columns c ON c.table_name = kcu.table_name AND c.column_name = kcu.column_name AND c.table_schema = kcu.table_schema
      WHERE tc.constraint_type = 'PRIMARY KEY' AND tc.table_schema = 'public'`,
    { type: QueryTypes.SELECT },
  );
  // Order: repeatedly take a table whose references are all copied. On a cycle, take one whose references left are
  // all nullable (they are written once the rest is in), then the one with fewest left.
  const ordered: string[] = [];
  const remaining = new Set(tables);
  while (remaining.size > 0) {
    const pending = (t: string) =>
      references.filter((r) => r.table_name === t && r.foreign_table !== t && remaining.has(r.foreign_table));
    const required = (t: string) => pending(t).filter((r) => !r.nullable).length;
    const ready = (t: string) => (pending(t).length === 0 ? 0 : 1);
    const next = [...remaining].sort(
      (a, b) =>
        ready(a) - ready(b) || required(a) - required(b) || pending(a).length - pending(b).length || a.localeCompare(b),
    )[0];
    ordered.push(next);
    remaining.delete(next);
  }
  const plans: TablePlan[] = [];
  for (const [index, name] of ordered.entries()) {
    const targetColumns = (
      await target.query<{ column_name: string }>(
        "SELECT column_name FROM information_schema.columns WHERE table_schema = 'public' AND table_name = :name",
        { replacements: { name }, type: QueryTypes.SELECT },
      )
    ).map((c) => c.column_name);
    const sourceColumns = new Set(
      (await source.query<{ name: string }>(`PRAGMA table_info(${q(name)})`, { type: QueryTypes.SELECT })).map(
        (c) => c.name,
      ),
    );
    if (sourceColumns.size === 0) throw new CopyRefused(`The SQLite file has no table ${name}.`);
    const key = keys.find((k) => k.table_name === name);
    if (!key) throw new CopyRefused(`Table ${name} has no primary key to copy by.`);
    const later = new Set(ordered.slice(index));
    plans.push({
      name,
      key: key.column_name,
      columns: targetColumns.filter((c) => sourceColumns.has(c)),
      deferred: references.filter((r) => r.table_name === name && later.has(r.foreign_table)).map((r) => r.column_name),
      serial: key.is_serial,
    });
  }
  return plans;
}

/**
 * Copies every table of a migrated SQLite database into a PostgreSQL database (migrated first), in one transaction:
 * rows are written by key (inserted or brought up to date) and rows the source no longer has are removed, so the
 * copy can be run again. The target must be empty of breweries or hold the same ones (same id and name): merging
 * two installations is refused. Reports the rows per table on both sides, counted after the copy.
 */
export async function copyDatabase(
  source: Sequelize,
  target: Sequelize,
  onProgress: (done: number, total: number, table: string) => void = () => undefined,
): Promise<CopyCount[]> {
  await migrate(target);
  const sourceBreweries = await source.query<{ id: number; name: string }>('SELECT id, name FROM organisations', {
    type: QueryTypes.SELECT,
  });
  const targetBreweries = await target.query<{ id: number; name: string }>('SELECT id, name FROM organisations', {
    type: QueryTypes.SELECT,
  });
  const strangers = targetBreweries.filter(
    (t) => !sourceBreweries.some((s) => Number(s.id) === Number(t.id) && s.name === t.name),
  );
  if (strangers.length > 0)
    throw new CopyRefused(
      `The target database already holds ${strangers.length} other ${strangers.length === 1 ? 'brewery' : 'breweries'} (${strangers
        .slice(0, 3)
        .map((s) => `"${s.name}"`)
        .join(
          ', ',
        )}). db:copy moves a whole installation into an empty PostgreSQL database, or again into the one it filled.`,
    );
  const tables = await plan(source, target);
  const sizes = new Map<string, number>();
  for (const table of tables) {
    const [{ n }] = await source.query<{ n: number }>(`SELECT count(*) AS n FROM ${q(table.name)}`, {
      type: QueryTypes.SELECT,
    });
    sizes.set(table.name, Number(n));
  }
  const total = [...sizes.values()].reduce((a, b) => a + b, 0);
  let done = 0;
  await target.transaction(async (t) => {
    // A database without breweries (at most a dataset import from its own first start) is emptied first, so its
    // ingredient ids cannot collide with the source's.
    if (targetBreweries.length === 0)
      await target.query(`TRUNCATE ${tables.map((p) => q(p.name)).join(', ')} RESTART IDENTITY CASCADE`, {
        transaction: t,
      });
    // Rows the source no longer has, children first.
    for (const table of [...tables].reverse()) {
      const keys = (
        await source.query<Record<string, unknown>>(`SELECT ${q(table.key)} AS k FROM ${q(table.name)}`, {
          type: QueryTypes.SELECT,
        })
      ).map((r) => r.k);
      await target.query(`DELETE FROM ${q(table.name)} WHERE NOT (${q(table.key)} = ANY($1))`, {
        bind: [keys],
        transaction: t,
      });
    }
    const later: { table: TablePlan; rows: Record<string, unknown>[] }[] = [];
    for (const table of tables) {
      onProgress(done, total, table.name);
      for (let offset = 0; ; offset += CHUNK) {
        const rows = await source.query<Record<string, unknown>>(
          `SELECT ${table.columns.map(q).join(', ')} FROM ${q(table.name)} ORDER BY ${q(table.key)} LIMIT ${CHUNK} OFFSET ${offset}`,
          { type: QueryTypes.SELECT },
        );
        if (rows.length === 0) break;
        await upsert(target, table, rows, t);
        if (table.deferred.length > 0) later.push({ table, rows });
        done += rows.length;
        onProgress(done, total, table.name);
        if (rows.length < CHUNK) break;
      }
    }
    for (const { table, rows } of later) {
      for (const row of rows) {
        const set = table.deferred;
        await target.query(
          `UPDATE ${q(table.name)} SET ${set.map((c, i) => `${q(c)} = $${i + 2}`).join(', ')} WHERE ${q(table.key)} = $1`,
          { bind: [row[table.key], ...set.map((c) => row[c])], transaction: t },
        );
      }
    }
    for (const table of tables.filter((p) => p.serial)) {
      await target.query(
        `SELECT setval(pg_get_serial_sequence('${table.name}', '${table.key}'), GREATEST((SELECT max(${q(table.key)}) FROM ${q(table.name)}), 1))`,
        { transaction: t },
      );
    }
  });
  const counts: CopyCount[] = [];
  for (const table of tables) {
    const [{ n }] = await target.query<{ n: number }>(`SELECT count(*) AS n FROM ${q(table.name)}`, {
      type: QueryTypes.SELECT,
    });
    counts.push({ table: table.name, source: sizes.get(table.name)!, target: Number(n) });
  }
  return counts;
}

async function upsert(
  target: Sequelize,
  table: TablePlan,
  rows: Record<string, unknown>[],
  transaction: Transaction,
): Promise<void> {
  const deferred = new Set(table.deferred);
  const bind: unknown[] = [];
  const tuples = rows.map(
    (row) =>
      `(${table.columns
        .map((c) => {
          bind.push(deferred.has(c) ? null : row[c]);
          return `$${bind.length}`;
        })
        .join(', ')})`,
  );
  const updates = table.columns.filter((c) => c !== table.key && !deferred.has(c));
  await target.query(
    `INSERT INTO ${q(table.name)} (${table.columns.map(q).join(', ')}) VALUES ${tuples.join(', ')}
     ON CONFLICT (${q(table.key)}) DO ${updates.length ? `UPDATE SET ${updates.map((c) => `${q(c)} = EXCLUDED.${q(c)}`).join(', ')}` : 'NOTHING'}`,
    { bind, transaction },
  );
}

/** One end of a file copy: an S3 client and its bucket. */
export interface Bucket {
  client: S3Client;
  bucket: string;
}

/**
 * Copies the stored files named by `keys` from one bucket to another, skipping those the target already has (so a
 * rerun copies only what is missing). Answers how many were copied, already there, and missing from the source.
 */
export async function copyFiles(
  from: Bucket,
  to: Bucket,
  keys: string[],
  onProgress: (done: number) => void = () => undefined,
): Promise<{ copied: number; present: number; missing: string[] }> {
  const report = { copied: 0, present: 0, missing: [] as string[] };
  for (const [index, key] of keys.entries()) {
    if (await bucketHas(to.client, to.bucket, key)) report.present += 1;
    else {
      try {
        const found = await from.client.send(new GetObjectCommand({ Bucket: from.bucket, Key: key }));
        const body = Buffer.from(await found.Body!.transformToByteArray());
        await to.client.send(
          new PutObjectCommand({ Bucket: to.bucket, Key: key, Body: body, ContentType: found.ContentType }),
        );
        report.copied += 1;
      } catch (error) {
        if ((error as { name?: string }).name !== 'NoSuchKey') throw error;
        report.missing.push(key);
      }
    }
    onProgress(index + 1);
  }
  return report;
}
