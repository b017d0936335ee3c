import { describe, expect, it } from 'vitest';
import express, { Router } from 'express';
import request from 'supertest';
import { z } from 'zod';
import { rawResponse, route } from '../../server/routes/route';
import { responseMismatch } from '../../server/routes/response-check';
import { errorHandler } from '../../server/middlewares/error-handler';

const thing = z.object({ data: z.object({ id: z.string(), tags: z.array(z.string()) }) });

/** A throwaway app of public routes, each answering a fixed body, with the real error handler. */
function appWith(declare: (router: Router) => void) {
  const app = express();
  const router = Router();
  declare(router);
  app.use(router);
  app.use(errorHandler);
  return app;
}

const base = { summary: 'test route', tags: ['test'], access: 'public' as const };

describe('responseMismatch', () => {
  it('a body that matches its schema — no mismatch', () => {
    expect(responseMismatch(thing, { data: { id: 'a', tags: ['x'] } })).toBeNull();
  });

  it('a wrong type deep in an array — names the path and the rule', () => {
    expect(responseMismatch(thing, { data: { id: 'a', tags: ['x', 3] } })).toBe(
      'data.tags[1]: Invalid input: expected string, received number',
    );
  });

  it('a key the schema does not know — named as not in the schema', () => {
    expect(responseMismatch(thing, { data: { id: 'a', tags: [], secret: 1 } })).toBe(
      'data.secret: not in the response schema',
    );
  });

  it('a Date in the body — checked as the ISO string the client receives', () => {
    const schema = z.object({ at: z.string() });
    expect(responseMismatch(schema, { at: new Date('2025-05-01T00:00:00Z') })).toBeNull();
  });

  it('a missing member — reported at its path', () => {
    expect(responseMismatch(thing, { data: { tags: [] } })).toBe(
      'data.id: Invalid input: expected string, received undefined',
    );
  });
});

describe('route() under tests — response checks', () => {
  it('a handler result that departs from the schema — 500 naming the route and the path', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'get',
        path: '/things/:id',
        response: thing,
        // Deliberately wrong: the cast stands for a presenter that drifted from its schema.
        handler: () => ({ data: { id: 7, tags: [] } }) as unknown as z.infer<typeof thing>,
      }),
    );
    const res = await request(app).get('/things/1');
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('response_mismatch');
    expect(res.body.error.message).toBe(
      'Response of GET /things/:id does not match its schema: data.id: Invalid input: expected string, received number',
    );
  });

  it('an extra field in a handler result — 500 naming the field', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'get',
        path: '/things',
        response: thing,
        handler: () => {
          const data = { id: 'a', tags: [], passwordHash: 'x' };
          return { data };
        },
      }),
    );
    const res = await request(app).get('/things');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toContain('data.passwordHash: not in the response schema');
  });

  it('a JSON route without a response schema — 500 saying it declares none', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'get',
        path: '/bare',
        // The type already refuses a result without a schema; the cast stands for code that slips by.
        handler: () => ({ data: 1 }) as unknown as undefined,
      }),
    );
    const res = await request(app).get('/bare');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toBe(
      'Response of GET /bare does not match its schema: the route sends JSON but declares no response schema',
    );
  });

  it('res.json called by the handler itself — checked like a returned result', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'post',
        path: '/things',
        response: thing,
        handler: ({ res }) => {
          res.status(201).json({ data: { id: 'a' } });
        },
      }),
    );
    const res = await request(app).post('/things');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toContain('data.tags: Invalid input: expected array');
  });

  it('a raw CSV route — its body goes out unchecked, documented as text/csv', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'get',
        path: '/things.csv',
        response: rawResponse('text/csv', 'an attachment'),
        handler: ({ res }) => {
          res.type('text/csv').send('id\na\n');
        },
      }),
    );
    const res = await request(app).get('/things.csv');
    expect(res.status).toBe(200);
    expect(res.text).toBe('id\na\n');
  });

  it('a raw route that sends JSON — 500 saying it declared another body', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'get',
        path: '/file',
        response: rawResponse('application/zip'),
        handler: ({ res }) => {
          res.json({ data: 1 });
        },
      }),
    );
    const res = await request(app).get('/file');
    expect(res.status).toBe(500);
    expect(res.body.error.message).toBe(
      'Response of GET /file does not match its schema: the route declares a non-JSON body (application/zip) but sent JSON',
    );
  });

  it('a matching result — sent as it is with the declared status', async () => {
    const app = appWith((router) =>
      route(router, {
        ...base,
        method: 'post',
        path: '/things',
        status: 201,
        response: thing,
        handler: () => ({ data: { id: 'a', tags: ['x'] } }),
      }),
    );
    const res = await request(app).post('/things');
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ data: { id: 'a', tags: ['x'] } });
  });
});
