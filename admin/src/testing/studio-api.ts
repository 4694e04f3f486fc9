import {
  emailSchema,
  nameSchema,
  passwordSchema,
  Role,
  studioSettingsBodySchema,
  type AuthUser,
  type StudioSettingsView,
} from '@nappe/shared';
import { http, HttpResponse } from 'msw';
import type { z } from 'zod';
import type { Dashboard } from '../features/insights/api/get-dashboard';
import type { Invitation } from '../features/users/api/invitations';
import type { UserListItem } from '../features/users/api/get-users';
import { chefUser, pageOf, sessionFor } from './fixtures';
import {
  dashboard as defaultDashboard,
  pendingInvitation,
  settingsView,
  teamAccounts,
  tokens,
} from './studio-fixtures';

/**
 * A stand-in for the studio's API (settings, dashboard, team, invitations, accept-invitation)
 * for route tests. Bodies are validated with the same shared schemas and answered in the same
 * shapes and words as the real controllers (api/src/studio/, api/src/insights/); every write
 * is recorded for the tests to check.
 */

/** As formatIssues in api/src/common/zod-validation.pipe.ts: "lines[0].quantity: message". */
function formatIssues(issues: readonly z.core.$ZodIssue[]): string[] {
  const lines = issues.map((issue) => {
    const where = issue.path
      .map((key, i) =>
        typeof key === 'number' ? `[${key}]` : `${i === 0 ? '' : '.'}${String(key)}`,
      )
      .join('');
    return where ? `${where}: ${issue.message}` : issue.message;
  });
  return [...new Set(lines)];
}

const badRequest = (message: string[]) =>
  HttpResponse.json({ statusCode: 400, message, error: 'Bad Request' }, { status: 400 });
const conflict = (message: string) =>
  HttpResponse.json({ statusCode: 409, message, error: 'Conflict' }, { status: 409 });
const notFound = (message: string) =>
  HttpResponse.json({ statusCode: 404, message, error: 'Not Found' }, { status: 404 });

export interface StudioApiOptions {
  dashboard?: Dashboard;
  /** The chef the requests come from (the API takes it from the token). */
  actor?: AuthUser;
  accounts?: UserListItem[];
  invitations?: Invitation[];
}

export function createStudioApi(options: StudioApiOptions = {}) {
  const actor = options.actor ?? chefUser;
  const state = {
    settings: structuredClone(settingsView) as StudioSettingsView,
    dashboard: options.dashboard ?? defaultDashboard,
    accounts: structuredClone(options.accounts ?? teamAccounts),
    invitations: structuredClone(options.invitations ?? [pendingInvitation]),
    requests: [] as Array<{ method: string; path: string; body?: unknown }>,
    /** When set, the next settings PUT is refused with these messages (rules only the server knows). */
    refuseNextSettings: null as string[] | null,
  };
  const record = async (request: Request, path: string) => {
    const body =
      request.method === 'GET' || request.method === 'DELETE'
        ? undefined
        : await request
            .clone()
            .json()
            .catch(() => undefined);
    state.requests.push({ method: request.method, path, ...(body !== undefined ? { body } : {}) });
    return body;
  };

  const handlers = [
    http.get('/api/insights/dashboard', () => HttpResponse.json(state.dashboard)),

    http.get('/api/studio/settings', () => HttpResponse.json(state.settings)),
    http.put('/api/studio/settings', async ({ request }) => {
      const body = await record(request, '/api/studio/settings');
      if (state.refuseNextSettings) {
        const messages = state.refuseNextSettings;
        state.refuseNextSettings = null;
        return badRequest(messages);
      }
      const parsed = studioSettingsBodySchema.safeParse(body);
      if (!parsed.success) return badRequest(formatIssues(parsed.error.issues));
      const before = state.settings;
      const fields = (Object.keys(parsed.data) as Array<keyof typeof parsed.data>).filter(
        (k) => JSON.stringify(before[k]) !== JSON.stringify(parsed.data[k]),
      );
      const now = new Date().toISOString();
      state.settings = {
        ...parsed.data,
        blackoutDates: [...parsed.data.blackoutDates].sort(),
        updatedAt: fields.length > 0 ? now : before.updatedAt,
        lastChange:
          fields.length > 0 ? { changedAt: now, changedBy: actor.name, fields } : before.lastChange,
      };
      return HttpResponse.json(state.settings);
    }),

    http.get('/api/users', ({ request }) => {
      const url = new URL(request.url);
      const live = state.accounts;
      return HttpResponse.json(
        pageOf(
          live,
          Number(url.searchParams.get('page')),
          Number(url.searchParams.get('pageSize')),
        ),
      );
    }),
    http.patch('/api/users/:id/role', async ({ request, params }) => {
      const body = (await record(request, `/api/users/${String(params.id)}/role`)) as {
        role?: string;
      };
      const user = state.accounts.find((u) => u.id === params.id);
      if (!user) return notFound('No team member with this id.');
      if (user.role === Role.Client) {
        return conflict(
          'This is a client account, not a team member: its role cannot be changed here, and only the client can close it.',
        );
      }
      if (body.role !== 'chef' && body.role !== 'staff') {
        return badRequest(['role: The role is either staff or chef.']);
      }
      const chefs = state.accounts.filter((u) => u.role === Role.Chef).length;
      if (user.role === Role.Chef && body.role !== 'chef' && chefs <= 1) {
        return conflict(
          'You cannot change this chef’s role: the studio needs at least one chef. Invite or promote another chef first.',
        );
      }
      user.role = body.role === 'chef' ? Role.Chef : Role.Staff;
      return HttpResponse.json({
        id: user.id,
        email: user.email,
        name: user.name,
        role: body.role,
      });
    }),
    http.delete('/api/users/:id', async ({ request, params }) => {
      await record(request, `/api/users/${String(params.id)}`);
      const user = state.accounts.find((u) => u.id === params.id);
      if (!user) return notFound('No team member with this id.');
      if (user.id === actor.id) {
        return conflict(
          'You cannot remove your own account. Another chef can remove it, if that is what you want.',
        );
      }
      state.accounts = state.accounts.filter((u) => u.id !== user.id);
      return new HttpResponse(null, { status: 204 });
    }),

    http.get('/api/studio/invitations', () => HttpResponse.json(state.invitations)),
    http.post('/api/studio/invitations', async ({ request }) => {
      const body = (await record(request, '/api/studio/invitations')) as Record<string, unknown>;
      const problems: string[] = [];
      const email = emailSchema.safeParse(body.email);
      if (!email.success)
        problems.push(...formatIssues(email.error.issues).map((m) => `email: ${m}`));
      const name = nameSchema.safeParse(body.name);
      if (!name.success) problems.push(...formatIssues(name.error.issues).map((m) => `name: ${m}`));
      if (body.role !== 'staff' && body.role !== 'chef') {
        problems.push('role: The role is either staff or chef.');
      }
      if (problems.length > 0 || !email.success || !name.success) return badRequest(problems);
      const address = email.data.toLowerCase();
      const existing = state.accounts.find((u) => u.email === address);
      if (existing) {
        return conflict(
          existing.role === Role.Client
            ? 'This e-mail belongs to a client account. Invite the team member with another address.'
            : 'This person is already on the team.',
        );
      }
      const invitation: Invitation = {
        id: `00000000-0000-4000-8000-${String(state.requests.length).padStart(12, '0')}`,
        email: address,
        name: name.data,
        role: body.role as 'staff' | 'chef',
        invitedBy: actor.name,
        createdAt: new Date().toISOString(),
        expiresAt: new Date(Date.now() + 7 * 86_400_000).toISOString(),
      };
      state.invitations = [
        invitation,
        ...state.invitations.filter((i) => i.email !== invitation.email),
      ];
      return HttpResponse.json(invitation, { status: 201 });
    }),
    http.delete('/api/studio/invitations/:id', async ({ request, params }) => {
      await record(request, `/api/studio/invitations/${String(params.id)}`);
      if (!state.invitations.some((i) => i.id === params.id)) {
        return notFound('No pending invitation with this id.');
      }
      state.invitations = state.invitations.filter((i) => i.id !== params.id);
      return new HttpResponse(null, { status: 204 });
    }),

    // As TeamService.accept: the link's problems first, then the password's strength.
    http.post('/api/auth/accept-invitation', async ({ request }) => {
      const body = (await record(request, '/api/auth/accept-invitation')) as Record<string, string>;
      const problems: string[] = [];
      const name = nameSchema.safeParse(body.name);
      if (!name.success) problems.push(...name.error.issues.map((i) => `name: ${i.message}`));
      const password = passwordSchema.safeParse(body.password);
      if (!password.success) {
        problems.push(...password.error.issues.map((i) => `password: ${i.message}`));
      }
      if (problems.length > 0) return badRequest(problems);
      if (body.token === tokens.expired) {
        return badRequest([
          'This invitation has expired (links work for 7 days). Ask the chef for a new one.',
        ]);
      }
      if (body.token === tokens.used) {
        return badRequest([
          'This invitation has already been used. Sign in with the password you chose, or ask the chef for a new one.',
        ]);
      }
      if (body.token !== tokens.valid) {
        return badRequest(['This invitation link is not valid. Ask the chef for a new one.']);
      }
      // The one common password these tests use; the real check is zxcvbn's (api/src/auth/password-strength.ts).
      if (body.password === 'password1234') {
        return badRequest([
          'This password is too easy to guess: it is a common password or a simple pattern. A few unrelated words make a strong one.',
        ]);
      }
      const user: AuthUser = {
        id: 'u-new-staff',
        email: pendingInvitation.email,
        name: name.data ?? '',
        role: Role.Staff,
      };
      return HttpResponse.json(sessionFor(user));
    }),
  ];
  return { state, handlers };
}
