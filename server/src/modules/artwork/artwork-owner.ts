import { randomBytes } from 'node:crypto';
import type { Request } from 'express';
import type { ArtworkOwner } from './artwork-repo.ts';
import { currentUserOf } from '../../auth/roles.ts';

declare module 'express-session' {
  interface SessionData {
    /** A visitor's key to the artwork they uploaded before signing in; signing in hands those uploads to the account. */
    artworkSessionKey?: string;
  }
}

/** Who owns artwork this request may see, or undefined for a visitor who has uploaded nothing. */
export function artworkOwnerOf(req: Request): ArtworkOwner | undefined {
  const user = currentUserOf(req);
  if (user) return { userId: user.id };
  const sessionKey = req.session?.artworkSessionKey;
  return sessionKey ? { sessionKey } : undefined;
}

/**
 * The owner an upload is stored under: the account, or for a visitor a random key kept in their session (which
 * creates the session, and so its cookie, on their first upload).
 */
export function artworkOwnerForUpload(req: Request): ArtworkOwner {
  const owner = artworkOwnerOf(req);
  if (owner) return owner;
  const sessionKey = randomBytes(24).toString('base64url');
  req.session.artworkSessionKey = sessionKey;
  return { sessionKey };
}
