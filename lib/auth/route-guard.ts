/**
 * The one check of every route handler (downloads, photos): session, then role, then the route's params
 * through their zod schema, before anything is read. Answers 401, 403 or 404 in plain words.
 */
import type { z } from 'zod';
import { currentUser } from './guard';
import { can, type Permission } from './permissions';
import type { SessionUser } from './session-store';

export function guardedRoute<S extends z.ZodType>(
  permission: Permission,
  paramsSchema: S,
  handle: (req: Request, user: SessionUser, params: z.output<S>) => Promise<Response>,
): (req: Request, ctx: { params: Promise<unknown> }) => Promise<Response> {
  return async (req, ctx) => {
    const user = await currentUser();
    if (!user) return new Response('Sign in first.', { status: 401 });
    if (!can(user.role, permission)) return new Response('Not allowed.', { status: 403 });
    const parsed = paramsSchema.safeParse(await ctx.params);
    if (!parsed.success) return new Response('Not found.', { status: 404 });
    return handle(req, user, parsed.data);
  };
}
