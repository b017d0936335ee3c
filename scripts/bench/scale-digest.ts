// The due-digest run of the scale part, as its own process (as the worker runs it): loads the app,
// prints its resident memory, runs the job's perform() at the instant given, prints the run's
// wall time and result as one JSON line, then waits for stdin to close, so the bench can read this
// process's high-water mark (VmHWM in /proc/<pid>/status) while it is still there.
import { performance } from 'node:perf_hooks';
import { sequelize } from '../../server/db';
import * as dueDigest from '../../jobs/due-digest';
import { memoryMb } from './scale-timing';

const now = new Date(process.argv[2] ?? Date.now());
await sequelize.query("DELETE FROM notifications WHERE kind = 'due_digest'");
const before = memoryMb('self');
const t = performance.now();
const result = await dueDigest.perform(now);
const ms = performance.now() - t;
console.log(JSON.stringify({ ms, result, before }));
await sequelize.close();
process.stdin.resume();
process.stdin.on('end', () => process.exit(0));
