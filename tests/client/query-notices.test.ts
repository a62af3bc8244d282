/**
 * Which failures become a notice (lib/query-client.ts): a background refresh of data already on screen
 * does, once; unless the page reports that query's failures itself (`meta.inlineErrors`), as Make cut plan
 * does for a job's progress, so one failure is never said twice.
 */
import { describe, expect, it, vi } from 'vitest';

const notify = vi.fn();
vi.mock('../../src/lib/notify', () => ({ notify: (...args: unknown[]) => notify(...args) }));

const { createQueryClient } = await import('../../src/lib/query-client');
const { ApiError } = await import('../../src/lib/api-client');

const offline = () => Promise.reject(new ApiError(0, 'network', 'Could not reach the server. Check the connection and try again.'));

describe('notices for failed refreshes', () => {
  it('a failed refresh of data on screen is one notice in plain words', async () => {
    notify.mockClear();
    const client = createQueryClient();
    client.setQueryData(['stock', 1], []);
    await client.fetchQuery({ queryKey: ['stock', 1], queryFn: offline, retry: false, staleTime: 0 }).catch(() => undefined);
    expect(notify).toHaveBeenCalledTimes(1);
    expect(notify).toHaveBeenCalledWith('Could not refresh: Could not reach the server. Check the connection and try again.', 'error');
  });

  it('a query whose page shows its own failure (meta.inlineErrors) makes no notice', async () => {
    notify.mockClear();
    const client = createQueryClient();
    client.setQueryData(['cut-plans', 1, 'job', 'j1'], { status: 'running' });
    await client
      .fetchQuery({ queryKey: ['cut-plans', 1, 'job', 'j1'], queryFn: offline, retry: false, staleTime: 0, meta: { inlineErrors: true } })
      .catch(() => undefined);
    expect(notify).not.toHaveBeenCalled();
  });

  it('a first load that fails makes no notice: the page shows the error in place', async () => {
    notify.mockClear();
    const client = createQueryClient();
    await client.fetchQuery({ queryKey: ['builds', 1], queryFn: offline, retry: false }).catch(() => undefined);
    expect(notify).not.toHaveBeenCalled();
  });
});
