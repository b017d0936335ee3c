import { useSyncExternalStore } from 'react';
import { outboxSnapshot, subscribeOutbox, type OutboxSnapshot } from './outbox';

/** The queue of work waiting on this phone, kept current (also across tabs). */
export const useOutbox = (): OutboxSnapshot =>
  useSyncExternalStore(subscribeOutbox, outboxSnapshot, outboxSnapshot);
