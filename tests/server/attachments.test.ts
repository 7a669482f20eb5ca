import fs from 'node:fs';
import path from 'node:path';

import type { Express } from 'express';
import request from 'supertest';

import { config } from '@/server/config';
import { Attachment } from '@/server/db';
import { closeObjectStore, getObject } from '@/server/services/object-store';

import {
  addMember,
  type Agent,
  asBuffer,
  signUpOwner,
  startApp,
  startRemoteStore,
  stopApp,
  storedKeys,
} from './helpers';

let app: Express;
let owner: Agent;
let developer: Agent;
let brewer: Agent;
let ingredientId: number;

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n');
const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(64, 1)]);

beforeAll(async () => {
  app = await startApp();
  owner = (await signUpOwner(app)).agent;
  developer = (await addMember(app, owner, 'developer')).agent;
  brewer = (await addMember(app, owner, 'brewer')).agent;
  const created = await developer
    .post('/api/ingredients')
    .send({
      name: 'Supplier mango purée',
      category: 'puree',
      servingSize: 100,
      sugarsG: 14,
      fermentableSharePct: 100,
      steepSharePct: 80,
    })
    .expect(201);
  ingredientId = created.body.id;
});
afterAll(async () => {
  await stopApp();
  fs.rmSync(config.uploadsDir, { recursive: true, force: true });
});

describe('POST /api/ingredients/:id/attachments', () => {
  it('keeps a PDF spec sheet under a generated name and serves it to members of the brewery', async () => {
    const res = await developer
      .post(`/api/ingredients/${ingredientId}/attachments`)
      .attach('file', PDF, 'spec sheet.pdf')
      .expect(201);
    expect(res.body).toMatchObject({
      name: 'spec sheet.pdf',
      mimeType: 'application/pdf',
      sizeBytes: PDF.length,
      url: `/api/attachments/${res.body.id}`,
    });
    const stored = await storedKeys();
    expect(stored.some((name) => /^[0-9a-f]{32}\.pdf$/.test(name))).toBe(true);
    expect(stored).not.toContain('spec sheet.pdf');
    const download = await brewer.get(res.body.url).buffer(true).parse(asBuffer).expect(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(Buffer.compare(download.body as Buffer, PDF)).toBe(0);
    const list = await brewer.get(`/api/ingredients/${ingredientId}/attachments`).expect(200);
    expect(list.body.map((a: { name: string }) => a.name)).toContain('spec sheet.pdf');
  });

  it('checks the content, not the name: a text file called .png is refused', async () => {
    await developer.post(`/api/ingredients/${ingredientId}/attachments`).attach('file', PNG, 'label.png').expect(201);
    const res = await developer
      .post(`/api/ingredients/${ingredientId}/attachments`)
      .attach('file', Buffer.from('just some text'), 'label.png')
      .expect(400);
    expect(res.body.error.fields.file).toMatch(/not a PDF, JPEG or PNG/);
  });

  it('refuses a file over the size limit, a missing file and a brewer, storing nothing', async () => {
    const before = (await storedKeys()).length;
    const big = Buffer.concat([PDF, Buffer.alloc(config.uploadMaxBytes + 1)]);
    const tooBig = await developer
      .post(`/api/ingredients/${ingredientId}/attachments`)
      .attach('file', big, 'big.pdf')
      .expect(413);
    expect(tooBig.body.error.message).toMatch(/too large/);
    await developer.post(`/api/ingredients/${ingredientId}/attachments`).field('note', 'no file').expect(400);
    await brewer.post(`/api/ingredients/${ingredientId}/attachments`).attach('file', PDF, 'x.pdf').expect(403);
    expect(await storedKeys()).toHaveLength(before);
  });

  it('never serves a file to another brewery', async () => {
    const res = await developer
      .post(`/api/ingredients/${ingredientId}/attachments`)
      .attach('file', PDF, 'private.pdf')
      .expect(201);
    const stranger = await signUpOwner(app);
    await stranger.agent.get(res.body.url).expect(404);
    await stranger.agent.get(`/api/ingredients/${ingredientId}/attachments`).expect(404);
    expect(path.isAbsolute(config.uploadsDir)).toBe(true);
  });
});

describe('the object store', () => {
  it('moves files kept as plain files in the uploads folder (before the object store) into it when it opens', async () => {
    await closeObjectStore();
    const legacy = `${'cd'.repeat(16)}.png`;
    fs.mkdirSync(config.uploadsDir, { recursive: true });
    fs.writeFileSync(path.join(config.uploadsDir, legacy), PNG);
    expect(await storedKeys()).toContain(legacy);
    expect(fs.existsSync(path.join(config.uploadsDir, legacy))).toBe(false);
    const body = await getObject(legacy);
    const chunks: Buffer[] = [];
    for await (const chunk of body!) chunks.push(chunk as Buffer);
    expect(Buffer.compare(Buffer.concat(chunks), PNG)).toBe(0);
  });

  it('uses the bucket S3_BUCKET names at S3_ENDPOINT, with the SDK’s usual credentials, and reports it', async () => {
    const remote = await startRemoteStore('brewery-files');
    const saved = { s3: config.s3, key: process.env.AWS_ACCESS_KEY_ID, secret: process.env.AWS_SECRET_ACCESS_KEY };
    process.env.AWS_ACCESS_KEY_ID = 'S3RVER';
    process.env.AWS_SECRET_ACCESS_KEY = 'S3RVER';
    config.s3 = {
      bucket: 'brewery-files',
      endpoint: remote.endpoint,
      region: 'eu-west-1',
      forcePathStyle: true,
    };
    await closeObjectStore();
    try {
      const health = await request(app).get('/api/health').expect(200);
      expect(health.body.storage).toEqual({ kind: 's3', bucket: 'brewery-files' });
      const res = await developer
        .post(`/api/ingredients/${ingredientId}/attachments`)
        .attach('file', PDF, 'remote.pdf')
        .expect(201);
      const row = await Attachment.findByPk(res.body.id);
      expect(await remote.keys()).toEqual([row!.storedName]);
      const download = await brewer.get(res.body.url).buffer(true).parse(asBuffer).expect(200);
      expect(Buffer.compare(download.body as Buffer, PDF)).toBe(0);
      // Another brewery still gets nothing, whatever the store.
      const stranger = await signUpOwner(app);
      await stranger.agent.get(res.body.url).expect(404);
    } finally {
      await closeObjectStore();
      config.s3 = saved.s3;
      process.env.AWS_ACCESS_KEY_ID = saved.key;
      process.env.AWS_SECRET_ACCESS_KEY = saved.secret;
      await remote.close();
    }
    const health = await request(app).get('/api/health').expect(200);
    expect(health.body.storage).toEqual({ kind: 'local', bucket: 'fizzwright-uploads' });
  });
});
