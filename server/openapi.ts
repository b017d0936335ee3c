import { z } from 'zod';
import {
  OpenAPIRegistry,
  OpenApiGeneratorV31,
  extendZodWithOpenApi,
  type RouteConfig,
} from '@asteasolutions/zod-to-openapi';

extendZodWithOpenApi(z);

// Routes register themselves here when their router is built (see routes/route.ts); keyed by
// method + path so building the app twice (tests) documents each route once.
const routes = new Map<string, RouteConfig>();

export function documentRoute(config: RouteConfig): void {
  routes.set(`${config.method} ${config.path}`, config);
}

/** The OpenAPI 3.1 document of every registered route, generated from the zod schemas. */
export function buildOpenApiDocument() {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'sessionCookie', {
    type: 'apiKey',
    in: 'cookie',
    name: 'hs_session',
  });
  registry.registerComponent('securitySchemes', 'apiKey', {
    type: 'http',
    scheme: 'bearer',
    description: 'An organization API key (hs_…), made by a manager; machine-data routes only',
  });
  for (const config of routes.values()) registry.registerPath(config);
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Hourstone API',
      version: '1.0.0',
      description:
        'Preventive-maintenance tracking for farm machinery. Errors answer { error: { code, message, fields? } }.',
    },
    servers: [{ url: '/api/v1' }],
  });
}
