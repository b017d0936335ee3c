// The due row's schema moved to shared/schemas/due.ts; re-exported while a route of another
// resource still imports it from here.
export { dueRowSchema } from '../../shared/schemas/due';
