// Loads the invented demo scenario. Flags:
//   --if-empty          load only when there is no organization (the default)
//   --reset             wipe every tenant table and load again
//   --allow-production  needed with NODE_ENV=production (the demo has a public password)
export {};

const args = new Set(process.argv.slice(2));
const known = ['--if-empty', '--reset', '--allow-production'];
const unknown = [...args].filter((a) => !known.includes(a));
if (unknown.length) {
  console.error(`demo: unknown option ${unknown.join(' ')} (use ${known.join(', ')})`);
  process.exit(2);
}

// Checked before anything connects to the database.
if (process.env.NODE_ENV === 'production' && !args.has('--allow-production')) {
  console.error(
    'The demo scenario has a public password; pass --allow-production to load it anyway',
  );
  process.exit(1);
}

const { sequelize } = await import('../server/db');
const { loadDemo } = await import('../server/seeders/demo');

const started = performance.now();
try {
  const summary = await loadDemo({ reset: args.has('--reset'), ifEmpty: !args.has('--reset') });
  const seconds = ((performance.now() - started) / 1000).toFixed(1);
  if (!summary) {
    console.log('demo: database has data, kept');
  } else {
    console.log(
      `demo: loaded ${summary.organizations} organizations, ${summary.users} users, ` +
        `${summary.machines} machines, ${summary.readings.toLocaleString('en-US')} readings in ${seconds} s`,
    );
  }
} catch (error) {
  console.error('demo: loading failed:', error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await sequelize.close();
}
