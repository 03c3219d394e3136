import { createHash } from 'node:crypto';
import { z } from 'zod';
import { escapeHtml } from '../html.ts';

/** A person the sign-in stand-in can sign in as. `sub` is the stable subject id the app keys users on. */
export interface FakeIdentity {
  sub: string;
  email: string;
  name: string;
  givenName: string;
  familyName: string;
}

export const fakeIdentityListSchema = z
  .array(
    z.object({
      sub: z.string().min(1).max(255),
      email: z.email(),
      name: z.string().min(1),
      givenName: z.string(),
      familyName: z.string(),
    }),
  )
  .refine(
    (people) => new Set(people.map((person) => person.sub)).size === people.length,
    'identity subs must be unique',
  );

function nameFromEmail(email: string): string {
  const localPart = email.split('@')[0];
  return localPart
    .split(/[._+-]+/)
    .filter(Boolean)
    .map((word) => word[0].toUpperCase() + word.slice(1))
    .join(' ');
}

/**
 * A person typed in on the sign-in page. Google subjects are 21-digit decimal strings; deriving one from the
 * normalised e-mail (a sha256 prefix) makes the same address the same person on every sign-in and restart.
 */
export function identityForEmail(email: string, typedName: string): FakeIdentity {
  const normalisedEmail = email.trim().toLowerCase();
  const digest = createHash('sha256').update(normalisedEmail).digest('hex');
  const sub = `1${BigInt(`0x${digest.slice(0, 16)}`)
    .toString()
    .padStart(20, '0')}`;
  const name = typedName.trim().replace(/\s+/g, ' ') || nameFromEmail(normalisedEmail);
  const [givenName, ...familyNames] = name.split(' ');
  return { sub, email: normalisedEmail, name, givenName, familyName: familyNames.join(' ') };
}

export function initialsOf(identity: FakeIdentity): string {
  const letters = [identity.givenName, identity.familyName].map((part) => part.trim()[0] ?? '').join('');
  return (letters || identity.email[0]).toUpperCase();
}

// The picture is an inline SVG so that nothing points at a remote host.
function avatarDataUrl(identity: FakeIdentity): string {
  const hue = parseInt(createHash('sha256').update(identity.sub).digest('hex').slice(0, 4), 16) % 360;
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96">` +
    `<circle cx="48" cy="48" r="48" fill="hsl(${hue} 45% 42%)"/>` +
    `<text x="48" y="60" font-family="sans-serif" font-size="36" font-weight="700" fill="#fff" text-anchor="middle">` +
    `${escapeHtml(initialsOf(identity))}</text></svg>`;
  return `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`;
}

/** The OpenID Connect userinfo body that passport-google-oauth20 parses when the profile URL ends in `/userinfo`. */
export function toUserinfo(identity: FakeIdentity) {
  return {
    sub: identity.sub,
    name: identity.name,
    given_name: identity.givenName,
    family_name: identity.familyName,
    email: identity.email,
    email_verified: true,
    picture: avatarDataUrl(identity),
  };
}
