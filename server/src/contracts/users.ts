import { z } from 'zod';

export const roles = ['customer', 'staff', 'owner'] as const;
export const role = z.enum(roles);
export type Role = z.infer<typeof role>;

/** The one name of each role wherever people read it: both apps, e-mails and refusals ("Only the studio owner can …"). */
export const roleWords: Record<Role, string> = { customer: 'Customer', staff: 'Studio team', owner: 'Studio owner' };

export const currentUser = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role,
});
export type CurrentUser = z.infer<typeof currentUser>;

export const meResponse = z.object({ user: currentUser });
export type MeResponse = z.infer<typeof meResponse>;

/** Where the browser goes after signing in: a path on this site only, never another host. */
export const returnToPath = z
  .string()
  .max(500)
  .regex(/^\/(?![/\\])[^\s]*$/, 'must be a path on this site, starting with a single "/"');
