import type { Role } from '../../server/src/contracts/users.ts';

/** One demo identity: the sign-in fake offers it, the tests sign in as it, and the seeds make it a user. */
export interface DemoPerson {
  /** The Google subject id the sign-in fake returns for this person. */
  sub: string;
  email: string;
  name: string;
  givenName: string;
  familyName: string;
  role: Role;
}

/** The studio's two people and three customers. The seeds give them user ids 1 to 5 in this order (see accounts.ts). */
export const demoPeople: DemoPerson[] = [
  {
    sub: 'demo-owner-marigold',
    email: 'marigold@wrenandbobbin.test',
    name: 'Marigold Ashby',
    givenName: 'Marigold',
    familyName: 'Ashby',
    role: 'owner',
  },
  {
    sub: 'demo-staff-tobias',
    email: 'tobias@wrenandbobbin.test',
    name: 'Tobias Fenwick',
    givenName: 'Tobias',
    familyName: 'Fenwick',
    role: 'staff',
  },
  {
    sub: 'demo-customer-priya',
    email: 'priya@example.test',
    name: 'Priya Castellanos',
    givenName: 'Priya',
    familyName: 'Castellanos',
    role: 'customer',
  },
  {
    sub: 'demo-customer-harriet',
    email: 'harriet@example.test',
    name: 'Harriet Okonkwo',
    givenName: 'Harriet',
    familyName: 'Okonkwo',
    role: 'customer',
  },
  {
    sub: 'demo-customer-dominic',
    email: 'dominic@example.test',
    name: 'Dominic Lark',
    givenName: 'Dominic',
    familyName: 'Lark',
    role: 'customer',
  },
];
