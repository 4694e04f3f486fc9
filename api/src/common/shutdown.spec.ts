import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { ShutdownState } from './shutdown.js';

describe('ShutdownState (QUALITY.md: SIGTERM under load — in-flight finish, new requests get 503)', () => {
  it('lets requests through until shutdown begins, then answers 503 with Connection: close', async () => {
    const state = new ShutdownState();
    const app = express();
    app.use(state.middleware);
    app.get('/x', (_req, res) => res.json({ ok: true }));
    await request(app).get('/x').expect(200);
    state.beforeApplicationShutdown();
    const res = await request(app).get('/x').expect(503);
    expect(res.headers.connection).toBe('close');
    expect(res.headers['retry-after']).toBe('5');
    expect(res.body.message).toMatch(/restarting/);
  });
});
