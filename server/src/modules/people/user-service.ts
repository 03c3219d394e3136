import type { Db } from '../../db/knex.ts';
import type { CurrentUser } from '../../contracts/users.ts';
import { findUserById, findUserForSignIn, insertUser, updateUserSignIn } from './user-repo.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';

export interface SignInProfile {
  googleSub: string;
  email: string | undefined;
  isEmailVerified: boolean;
  name: string | undefined;
}

/**
 * Sign-in and the user lookup behind every request. Everyone who signs in for the first time is a customer, except
 * addresses listed in OWNER_EMAILS, who become owners; staff are promoted by an owner.
 */
export function createUserService(deps: { db: Db; ownerEmails: string[] }) {
  const { db, ownerEmails } = deps;

  async function signIn(profile: SignInProfile): Promise<Result<CurrentUser>> {
    const email = profile.email?.trim().toLowerCase();
    if (!email || !profile.isEmailVerified) {
      return failure('forbidden', 'Your sign-in account has no verified e-mail address, which we need for proofs.');
    }
    const name = profile.name?.trim() || email.split('@')[0]!;
    const isListedOwner = ownerEmails.includes(email);
    const existing = await findUserForSignIn(db, profile.googleSub, email);
    if (existing) {
      if (existing.googleSub && existing.googleSub !== profile.googleSub) {
        return failure('conflict', 'This e-mail address is already linked to a different sign-in account.');
      }
      const role = isListedOwner ? 'owner' : undefined;
      await updateUserSignIn(db, existing.id, { googleSub: profile.googleSub, name, role });
      return ok({ ...existing, name, role: role ?? existing.role });
    }
    const role = isListedOwner ? 'owner' : 'customer';
    const id = await insertUser(db, { googleSub: profile.googleSub, email, name, role });
    return ok({ id, email, name, role });
  }

  return { signIn, findById: (id: number) => findUserById(db, id) };
}

export type UserService = ReturnType<typeof createUserService>;
