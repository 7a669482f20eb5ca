import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { S3Client } from '@aws-sdk/client-s3';
import type { Express } from 'express';
import S3rver from 's3rver';
import request from 'supertest';

import type { Session } from '@/lib/api/types';
import type { Role } from '@/lib/roles';
import { createApp } from '@/server/app';
import { OutboxMessage, prepareDatabase, sequelize } from '@/server/db';
import { closeObjectStore, listBucket, listObjects } from '@/server/services/object-store';

export type Agent = ReturnType<typeof request.agent>;

/** A migrated database of this test file's own and the app on top of it. */
export async function startApp(): Promise<Express> {
  await prepareDatabase();
  return createApp();
}

export async function stopApp(): Promise<void> {
  await closeObjectStore();
  await sequelize.close();
}

/** The keys of every file in the object store (the local fake in tests), through the same SDK calls the app makes. */
export async function storedKeys(): Promise<string[]> {
  const keys: string[] = [];
  for await (const object of listObjects()) keys.push(object.key);
  return keys;
}

let counter = 0;
export const uniqueEmail = (prefix = 'person') =>
  `${prefix}-${++counter}-${Math.random().toString(36).slice(2, 7)}@brewery.test`;

/** Signs up a new brewery, follows the confirmation link from the outbox, and returns an agent carrying its owner's session cookie. */
export async function signUpOwner(
  app: Express,
  overrides: Partial<{ breweryName: string; name: string; email: string; password: string }> = {},
) {
  const agent = request.agent(app);
  const body = {
    breweryName: 'Test Ferments',
    name: 'Olwen Test',
    email: uniqueEmail('owner'),
    password: 'correct-horse-1',
    ...overrides,
  };
  await agent.post('/api/auth/sign-up').send(body).expect(202);
  const { token } = await linkFromOutbox(body.email);
  const res = await agent.post('/api/auth/confirm-sign-up').send({ token }).expect(201);
  return { agent, session: res.body as Session, email: body.email, password: body.password };
}

/** The one-time link in the newest outbox message to an address. */
export async function linkFromOutbox(to: string): Promise<{ path: string; token: string }> {
  const message = await OutboxMessage.findOne({ where: { to }, order: [['id', 'DESC']] });
  if (!message) throw new Error(`no message to ${to}`);
  const match = /https?:\/\/[^/\s]+(\/[^\s?]+)\?token=([^\s]+)/.exec(message.text);
  if (!match) throw new Error(`no link in message to ${to}`);
  return { path: match[1], token: decodeURIComponent(match[2]) };
}

/** Invites someone with a role, accepts the invitation, and returns an agent signed in as them. */
export async function addMember(app: Express, owner: Agent, role: Role, name = `Member ${role}`) {
  const email = uniqueEmail(role);
  await owner.post('/api/team/invitations').send({ email, role }).expect(201);
  const { token } = await linkFromOutbox(email);
  const agent = request.agent(app);
  const res = await agent
    .post('/api/auth/accept-invitation')
    .send({ token, name, password: 'member-pass-1' })
    .expect(201);
  return { agent, session: res.body as Session, email, password: 'member-pass-1' };
}

/** Reads a response body whole, as bytes (supertest parses only text types by itself): `.buffer(true).parse(asBuffer)`. */
export const asBuffer = (r: import('superagent').Response, cb: (err: Error | null, body: unknown) => void) => {
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => cb(null, Buffer.concat(chunks)));
};

/**
 * Another S3-compatible server on loopback, standing in for a brewery's object store (S3_BUCKET at S3_ENDPOINT),
 * reached with the credentials `S3RVER`/`S3RVER`: its address, the keys in its bucket, and a way to stop it.
 */
export async function startRemoteStore(bucket: string) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-remote-s3-'));
  const server = new S3rver({
    address: '127.0.0.1',
    port: 0,
    silent: true,
    directory: dir,
    configureBuckets: [{ name: bucket }],
  });
  const endpoint = `http://127.0.0.1:${(await server.run()).port}`;
  const client = new S3Client({
    region: 'us-east-1',
    endpoint,
    forcePathStyle: true,
    credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' },
  });
  return {
    endpoint,
    async keys(): Promise<string[]> {
      const keys: string[] = [];
      for await (const object of listBucket(client, bucket)) keys.push(object.key);
      return keys;
    },
    async close(): Promise<void> {
      client.destroy();
      await server.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
