// Vitest global setup for the unit and API run. `npm test` starts the test database, migrates it
// and passes DATABASE_URL; a bare `vitest` does not. Pure unit tests (tests/shared) need no
// database, so this only warns; tests that need one fail on their own with a clear message.
export function setup(): void {
  if (!process.env.DATABASE_URL) {
    console.warn(
      'DATABASE_URL is not set: tests that need the database will fail. Run `npm test` ' +
        '(add `-- --unit-only` to skip the type check, lint, build and browser tests), which starts ' +
        'a PostgreSQL test cluster and sets DATABASE_URL for you.',
    );
  }
}
