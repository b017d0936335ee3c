import { useSyncExternalStore } from 'react';
import { outboxSnapshot, subscribeOutbox, type OutboxSnapshot } from './outbox';

/** The queue of walkarounds waiting on this phone, kept current. */
export const useOutbox = (): OutboxSnapshot =>
  useSyncExternalStore(subscribeOutbox, outboxSnapshot, outboxSnapshot);
