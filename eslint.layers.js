// Folder rules of docs/ARCHITECTURE.md, enforced by ESLint (eslint.config.js): which layer may
// import which. A zone forbids files under `target` to import anything under `from`.
import fs from 'node:fs';

const message = (why) => `${why} (docs/ARCHITECTURE.md, folder rules)`;

export const layerZones = [
  {
    target: './shared',
    from: ['./server', './src', './jobs', './scripts'],
    message: message('shared/ is used by client and server, so it imports neither'),
  },
  {
    target: './src',
    from: ['./server', './jobs', './scripts'],
    message: message(
      'The client reaches the server over HTTP only; its types come from shared/schemas',
    ),
  },
  {
    target: ['./server', './jobs'],
    from: './src',
    message: message('The server never imports client code'),
  },
  {
    target: './server/infra',
    from: ['./server/services', './server/routes', './server/presenters', './server/middlewares'],
    message: message('Infrastructure knows nothing of the domain services or the HTTP layer'),
  },
  {
    target: './server/services',
    from: ['./server/routes', './server/presenters', './server/middlewares'],
    message: message('Services return domain data; routers present it'),
  },
  {
    target: './server/policies',
    from: ['./server/routes', './server/presenters', './server/services', './server/infra'],
    message: message('Policies are decisions over rows already loaded'),
  },
  {
    target: './server/presenters',
    from: ['./server/routes', './server/middlewares', './server/infra'],
    message: message('Presenters only shape rows into response schemas'),
  },
  {
    target: './server/models',
    from: [
      './server/routes',
      './server/services',
      './server/presenters',
      './server/policies',
      './server/middlewares',
      './server/infra',
    ],
    message: message('Models are the bottom layer'),
  },
];

const features = fs
  .readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

/** Features never import each other: they share through src/lib and src/components. */
export const featureZones = features.map((feature) => ({
  target: `./src/features/${feature}`,
  from: './src/features',
  except: [`./${feature}`],
  message: message(
    'Features never import each other: share through src/lib or src/components, compose in src/app',
  ),
}));

/** Routers call services; they may name a model's type but never query it. */
export const routerModelImports = {
  patterns: [
    {
      group: ['**/models', '**/models/*', '**/db'],
      allowTypeImports: true,
      message: message(
        'Routers call one service; queries and transactions live in server/services',
      ),
    },
  ],
};
