import { randomId } from '../random-id.ts';
import type { FakeIdentity } from './fake-identity.ts';

interface AuthorizationGrant {
  identity: FakeIdentity;
  clientId: string;
  redirectUri: string;
  accessToken?: string;
}

type Redemption = { ok: true; accessToken: string } | { ok: false; description: string };

/**
 * Authorization codes and access tokens, in memory. Both are random, as the real provider's are, so a code or token
 * from before a restart is simply unknown afterwards instead of naming someone else's grant.
 */
export function createGrantStore() {
  const grants = new Map<string, AuthorizationGrant>();
  const tokens = new Map<string, FakeIdentity>();

  return {
    issueCode(identity: FakeIdentity, clientId: string, redirectUri: string): string {
      const code = randomId('code-', 32);
      grants.set(code, { identity, clientId, redirectUri });
      return code;
    },

    redeemCode(code: string, clientId: string, redirectUri: string | undefined): Redemption {
      const grant = grants.get(code);
      if (!grant) return { ok: false, description: 'The authorization code is unknown.' };
      if (grant.accessToken) {
        // RFC 6749 §4.1.2: a code presented twice is refused, and the tokens issued for it are revoked.
        tokens.delete(grant.accessToken);
        return { ok: false, description: 'The authorization code was already used.' };
      }
      if (grant.clientId !== clientId) return { ok: false, description: 'The code was issued to another client.' };
      if (grant.redirectUri !== redirectUri) {
        return { ok: false, description: 'redirect_uri does not match the one the code was issued for.' };
      }
      const accessToken = randomId('token-', 43);
      grant.accessToken = accessToken;
      tokens.set(accessToken, grant.identity);
      return { ok: true, accessToken };
    },

    identityForToken(accessToken: string): FakeIdentity | undefined {
      return tokens.get(accessToken);
    },
  };
}
