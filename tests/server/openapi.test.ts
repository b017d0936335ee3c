import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { Validator } from '@seriousme/openapi-schema-validator';
import { createApp } from '../../server/app';
import { routesWithoutResponseSchema } from '../../server/routes/route';

const app = createApp();

describe('OpenAPI document', () => {
  it('openapi.json — validates against the OpenAPI 3.1 schema (reference validator)', async () => {
    const res = await request(app).get('/api/v1/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.openapi).toBe('3.1.0');
    const validator = new Validator();
    const result = await validator.validate(res.body);
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
  });

  it('openapi.json — lists every route the API answers', async () => {
    const res = await request(app).get('/api/v1/openapi.json');
    const documented = new Set<string>();
    for (const [p, ops] of Object.entries(
      res.body.paths as Record<string, Record<string, unknown>>,
    )) {
      for (const method of Object.keys(ops)) documented.add(`${method.toUpperCase()} ${p}`);
    }
    // The Express router stack of /api/v1, walked: every route must be documented.
    const answered = listRoutes(app);
    const undocumented = answered.filter(
      (r) => !documented.has(r) && !/\/(health|openapi\.json)$/.test(r),
    );
    expect(undocumented).toEqual([]);
    // …and every documented operation is a route the API answers (so the walk found them all).
    expect([...documented].filter((d) => !answered.includes(d))).toEqual([]);
  });

  it('route() — every route declares its response schema (or a raw body, or answers 204)', () => {
    expect(routesWithoutResponseSchema()).toEqual([]);
  });
});

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  name?: string;
}

function listRoutes(app: ReturnType<typeof createApp>): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const m of Object.keys(layer.route.methods)) {
          out.push(`${m.toUpperCase()} ${layer.route.path.replace(/:(\w+)/g, '{$1}')}`);
        }
      } else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack);
  return out;
}
