import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { MutationObserver, type QueryClient } from '@tanstack/react-query';
import { ApiError } from '../../src/lib/api-client';
import {
  createQueryClient,
  retryDelayMs,
  shouldRetryQuery,
  UNAVAILABLE_RETRIES,
} from '../../src/lib/query-client';
import { isRetryingUnavailable } from '../../src/components/errors/reconnecting-banner';

const unavailable = () =>
  new ApiError({ status: 503, code: 'unavailable', message: 'database restarting', retryAfter: 5 });
const notFound = () =>
  new ApiError({ status: 404, code: 'not_found', message: 'Machine not found' });

describe('query client — retries while the server or its database is away', () => {
  it('shouldRetryQuery — 503 and no connection get up to 8 tries; 404 none; a 500 two', () => {
    expect(shouldRetryQuery(UNAVAILABLE_RETRIES - 1, unavailable())).toBe(true);
    expect(shouldRetryQuery(UNAVAILABLE_RETRIES, unavailable())).toBe(false);
    const offline = new ApiError({ status: 0, code: 'unreachable', message: 'offline' });
    expect(shouldRetryQuery(5, offline)).toBe(true);
    expect(shouldRetryQuery(0, notFound())).toBe(false);
    const bug = new ApiError({ status: 500, code: 'internal', message: 'bug' });
    expect([0, 1, 2].map((n) => shouldRetryQuery(n, bug))).toEqual([true, true, false]);
  });

  it('retryDelayMs — doubles from 1 s to a 15 s cap and waits at least the Retry-After', () => {
    const plain = new ApiError({ status: 502, code: 'unreachable', message: 'gateway' });
    expect([1, 2, 3, 4, 5, 6].map((n) => retryDelayMs(n, plain))).toEqual([
      1000, 2000, 4000, 8000, 15000, 15000,
    ]);
    expect(retryDelayMs(1, unavailable())).toBe(5000); // Retry-After: 5
  });

  describe('with a query client (fake timers stand in for the backoff)', () => {
    let client: QueryClient;
    beforeEach(() => {
      vi.useFakeTimers();
      client = createQueryClient({ onUnauthorized: () => undefined });
    });
    afterEach(() => {
      client.clear();
      vi.useRealTimers();
    });

    it('a read that answers 503 twice — retried, flagged for the banner meanwhile, then succeeds', async () => {
      const answers = [unavailable(), unavailable(), { data: 'due list' }];
      const queryFn = vi.fn(async () => {
        const next = answers.shift();
        if (next instanceof ApiError) throw next;
        return next;
      });
      const result = client.fetchQuery({ queryKey: ['due'], queryFn });
      await vi.advanceTimersByTimeAsync(0);
      const query = client.getQueryCache().find({ queryKey: ['due'] })!;
      expect(isRetryingUnavailable(query)).toBe(true);
      await vi.advanceTimersByTimeAsync(10_000);
      await expect(result).resolves.toEqual({ data: 'due list' });
      expect(queryFn).toHaveBeenCalledTimes(3);
      expect(isRetryingUnavailable(query)).toBe(false);
    });

    it('a read that answers 404 — not retried, not flagged for the banner', async () => {
      const queryFn = vi.fn(async () => {
        throw notFound();
      });
      await expect(client.fetchQuery({ queryKey: ['machine'], queryFn })).rejects.toThrow(
        'Machine not found',
      );
      expect(queryFn).toHaveBeenCalledTimes(1);
      expect(isRetryingUnavailable(client.getQueryCache().find({ queryKey: ['machine'] })!)).toBe(
        false,
      );
    });

    it('a write that answers 503 — sent once; the person sees the message and may try again', async () => {
      const mutationFn = vi.fn(async () => {
        throw unavailable();
      });
      const observer = new MutationObserver(client, { mutationFn });
      await expect(observer.mutate()).rejects.toThrow('database restarting');
      await vi.advanceTimersByTimeAsync(60_000);
      expect(mutationFn).toHaveBeenCalledTimes(1);
    });
  });
});
