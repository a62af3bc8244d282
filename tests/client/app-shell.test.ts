/**
 * The app shell's rules, without a browser: which nav tab is current, which pages a role may open
 * (PRODUCT.md §2, `can()` in shared/schemas/api.schema.ts), what the error page says for each HTTP status
 * (RFC 9110 §15: 403 Forbidden, 404 Not Found, 429 Too Many Requests, 5xx server errors; status 0 is our
 * "no answer at all"), and that a page whose code cannot be fetched ends in a plain error, not a blank page.
 */
import { QueryClient } from '@tanstack/react-query';
import { isRouteErrorResponse } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { ROLES, can, type MeDto, type Permission, type Role } from '../../shared/schemas/api.schema';
import { page } from '../../src/app/router';
import { requirePermission, workshopTitle } from '../../src/app/routes/workshop';
import { countWords } from '../../src/components/cut-plan/plan-sheets';
import { cutWords } from '../../src/components/cut-plan/sheet-card';
import { describeRouteError } from '../../src/components/errors/route-error';
import { isCurrent } from '../../src/components/layouts/app-layout';
import { isRetryable } from '../../src/components/ui/states';
import { authKeys } from '../../src/features/auth/api/keys';
import { jobReadProblem } from '../../src/features/cut-plans/api/nest-jobs';
import { soleOwnerId } from '../../src/features/workshops/members';
import { ApiError } from '../../src/lib/api-client';

describe('nav tabs', () => {
  const builds = { to: '/w/3/builds', alsoFor: /\/cut-plans\/\d+(\/share)?$/ };
  const checklists = { to: '/w/3/checklists', alsoFor: /\/cut-plans\/\d+\/checklist$/ };

  it('a tab is current on its own page and below it, not on a page that only starts with the same letters', () => {
    expect(isCurrent(builds, '/w/3/builds')).toBe(true);
    expect(isCurrent(builds, '/w/3/builds/12')).toBe(true);
    expect(isCurrent({ to: '/w/3/design' }, '/w/3/designs')).toBe(false);
  });

  it('a cut plan and its share page belong to Builds; its checklist to Checklists, not both', () => {
    expect(isCurrent(builds, '/w/3/cut-plans/7')).toBe(true);
    expect(isCurrent(builds, '/w/3/cut-plans/7/share')).toBe(true);
    expect(isCurrent(builds, '/w/3/cut-plans/7/checklist')).toBe(false);
    expect(isCurrent(checklists, '/w/3/cut-plans/7/checklist')).toBe(true);
    expect(isCurrent(checklists, '/w/3/cut-plans/7')).toBe(false);
  });
});

describe('pages only some roles may open', () => {
  const me = (role: Role): MeDto => ({
    user: { id: 1, email: `${role}@example.test`, units: 'mm' },
    memberships: [{ workshopId: 5, workshopName: 'Test bench', role }],
  });
  const client = (role: Role) => {
    const queryClient = new QueryClient();
    queryClient.setQueryData(authKeys.me(), me(role));
    return queryClient;
  };
  const outcome = async (role: Role, permission: Permission, workshopId = '5') => {
    try {
      await requirePermission(client(role), { workshopId }, permission);
      return 200;
    } catch (error) {
      // A thrown `data(…, {status})` (react-router), which the router turns into the route's error response.
      return isRouteErrorResponse(error) ? error.status : ((error as { init?: { status?: number } }).init?.status ?? 'other');
    }
  };

  // The table of PRODUCT.md §2: stock room (readStock: owner, designer, maker), invitations and sent mail
  // (manageMembers: owner), share links (exportPlans: owner, designer, maker).
  for (const permission of ['readStock', 'manageMembers', 'exportPlans'] as const) {
    for (const role of ROLES) {
      const expected = can(role, permission) ? 200 : 403;
      it(`${role} → ${permission}: ${expected}`, async () => {
        expect(await outcome(role, permission)).toBe(expected);
      });
    }
  }

  it('the viewer is refused the stock room and the owner pages, the maker the owner pages only', async () => {
    expect(await outcome('viewer', 'readStock')).toBe(403);
    expect(await outcome('maker', 'readStock')).toBe(200);
    expect(await outcome('maker', 'manageMembers')).toBe(403);
    expect(await outcome('designer', 'manageMembers')).toBe(403);
  });

  it('another workshop is 403 whatever the role; a workshop id that is not a number is 404', async () => {
    expect(await outcome('owner', 'readStock', '6')).toBe(403);
    expect(await outcome('owner', 'readStock', 'abc')).toBe(404);
  });

  it('titles name the page, then the workshop', () => {
    expect(workshopTitle('Stock room', 'Harbour Lane Audio')).toBe('Stock room · Harbour Lane Audio · Boxwright');
  });
});

describe('the error page in plain words', () => {
  it('403, 404 and a lost connection each get their own title; Reload is offered only where it may help', () => {
    expect(describeRouteError(new ApiError(403, 'forbidden', 'x'))).toMatchObject({ title: 'No access', canRetry: false });
    expect(describeRouteError(new ApiError(404, 'not_found', 'x'))).toMatchObject({ title: 'Not found', canRetry: false });
    expect(describeRouteError(new ApiError(0, 'network', 'Could not reach the server.'))).toMatchObject({
      title: 'Could not reach the server',
      message: 'Could not reach the server.',
      canRetry: true,
    });
    expect(describeRouteError(new ApiError(503, 'http_503', 'The server had a problem.')).canRetry).toBe(true);
    expect(describeRouteError(new ApiError(400, 'invalid', 'x')).canRetry).toBe(false);
  });

  it('an unexpected crash shows a fixed sentence, never the error text or its stack', () => {
    const crash = new TypeError("Cannot read properties of undefined (reading 'map')");
    const shown = describeRouteError(crash);
    expect(shown.title).toBe('Something went wrong');
    expect(shown.message).not.toContain('undefined');
    expect(shown.message).not.toContain('TypeError');
  });

  it('Try again is offered for no answer, 429 and 5xx; not for 400, 403 or 404', () => {
    expect([0, 429, 500, 502].map((s) => isRetryable(new ApiError(s, 'x', 'x')))).toEqual([true, true, true, true]);
    expect([400, 403, 404, 409].map((s) => isRetryable(new ApiError(s, 'x', 'x')))).toEqual([false, false, false, false]);
  });
});

describe('a page whose code cannot be fetched', () => {
  it('resolves to a loader that fails with a plain "no answer" error (status 0) instead of rejecting', async () => {
    const failing = page(() => Promise.reject(new TypeError('Failed to fetch dynamically imported module: /assets/build-x.js')));
    const route = await failing();
    expect(typeof route.loader).toBe('function');
    let thrown: unknown;
    try {
      (route.loader as () => unknown)();
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(ApiError);
    expect((thrown as ApiError).status).toBe(0);
    expect((thrown as ApiError).message).not.toContain('assets');
  });

  it('passes a page that loads through unchanged', async () => {
    const Component = () => null;
    expect(await page(async () => ({ Component }))()).toEqual({ Component });
  });
});

describe('members and cut plan jobs', () => {
  it('the only owner is locked (the server refuses to demote or remove the last owner); two owners are not', () => {
    expect(soleOwnerId([{ userId: 1, role: 'owner' }, { userId: 2, role: 'maker' }])).toBe(1);
    expect(soleOwnerId([{ userId: 1, role: 'owner' }, { userId: 2, role: 'owner' }])).toBeUndefined();
  });

  it('a job the server no longer knows (404 after a restart) is lost; any other failed read is a lost connection', () => {
    expect(jobReadProblem(null)).toBeNull();
    expect(jobReadProblem(new ApiError(404, 'not_found', 'x'))).toBe('lost');
    expect(jobReadProblem(new ApiError(0, 'network', 'x'))).toBe('offline');
    expect(jobReadProblem(new ApiError(502, 'http_502', 'x'))).toBe('offline');
  });
});

describe('cut plan words', () => {
  // A rip cut runs along the board's length (with the grain), a cross cut across it (common practice);
  // lining batt on a roll is cut with a knife, so the roll's cuts are "along" and "across the roll".
  const rip = { kind: 'rip', x1: 0, y1: 528.8, x2: 1200, y2: 528.8 };
  const cross = { kind: 'cross', x1: 1011.6, y1: 0, x2: 1011.6, y2: 257 };

  it('boards get saw terms, rolls plain ones; length and position are read from the cut line', () => {
    expect(cutWords(rip, false)).toBe('Rip cut, 1200 mm long, at y 528.8');
    expect(cutWords(cross, false)).toBe('Cross cut, 257 mm long, at x 1011.6');
    expect(cutWords(rip, true)).toBe('Cut along the roll, 1200 mm long, at y 528.8');
    expect(cutWords(cross, true)).toBe('Cut across the roll, 257 mm long, at x 1011.6');
  });

  it('counts sheets, remnants and roll lengths in words', () => {
    expect(countWords([{ kind: 'sheet' }, { kind: 'sheet' }, { kind: 'remnant' }])).toBe('2 sheets and 1 remnant');
    expect(countWords([{ kind: 'roll' }])).toBe('1 roll length');
    expect(countWords([])).toBe('nothing laid out');
  });
});
