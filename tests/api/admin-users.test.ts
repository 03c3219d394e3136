import { beforeAll, describe, expect, it } from 'vitest';
import { peopleResponse, personResponse } from '../../server/src/contracts/admin-users.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';

const harness = useApiHarness();
let owner: ApiAgent;
let staff: ApiAgent;
let dominic: ApiAgent;
beforeAll(async () => {
  owner = harness.agent();
  staff = harness.agent();
  dominic = harness.agent();
  await harness.signIn(owner, 'marigold@wrenandbobbin.test');
  await harness.signIn(staff, 'tobias@wrenandbobbin.test');
  await harness.signIn(dominic, 'dominic@example.test');
});

const ids = { marigold: 1, tobias: 2, dominic: 5 };

describe('/api/admin/users', () => {
  it('when the owner lists people, then owners come first, then staff, then customers, and the OWNER_EMAILS owner is marked', async () => {
    const { people } = peopleResponse.parse((await owner.get('/api/admin/users').expect(200)).body);
    expect(people.map((p) => [p.name, p.role])).toEqual([
      ['Marigold Ashby', 'owner'],
      ['Tobias Fenwick', 'staff'],
      ['Dominic Lark', 'customer'],
      ['Harriet Okonkwo', 'customer'],
      ['Priya Castellanos', 'customer'],
    ]);
    expect(people[0].isListedOwner).toBe(true);
    const found = peopleResponse.parse((await owner.get('/api/admin/users?search=okonk').expect(200)).body);
    expect(found.people.map((p) => p.email)).toEqual(['harriet@example.test']);
  });

  it('when staff or a customer ask, then every route answers 403, staff with the owner named', async () => {
    const res = await staff.get('/api/admin/users').expect(403);
    expect(res.body.error.message).toBe('Only the studio owner can see and change who works in the studio.');
    await staff.put(`/api/admin/users/${ids.dominic}/role`).send({ role: 'staff' }).expect(403);
    await dominic.get('/api/admin/users').expect(403);
    await dominic.put(`/api/admin/users/${ids.dominic}/role`).send({ role: 'staff' }).expect(403);
  });

  it('when the owner grants staff to a customer, then their very next request is let into the studio; removing it shuts them out again', async () => {
    await dominic.get('/api/admin/overview').expect(403);
    const granted = personResponse.parse(
      (await owner.put(`/api/admin/users/${ids.dominic}/role`).send({ role: 'staff' }).expect(200)).body,
    );
    expect(granted.person).toMatchObject({ name: 'Dominic Lark', role: 'staff' });
    await dominic.get('/api/admin/overview').expect(200);
    expect((await dominic.get('/api/me').expect(200)).body.user.role).toBe('staff');

    await owner.put(`/api/admin/users/${ids.dominic}/role`).send({ role: 'customer' }).expect(200);
    await dominic.get('/api/admin/overview').expect(403);
  });

  it('when the owner changes their own role or another owner’s, then it answers 409 with the reason', async () => {
    expect(
      (await owner.put(`/api/admin/users/${ids.marigold}/role`).send({ role: 'staff' }).expect(409)).body.error.message,
    ).toBe('You can’t change your own role.');
    await harness
      .db('users')
      .insert({ id: 6, email: 'second.owner@wrenandbobbin.test', name: 'Second Owner', role: 'owner' });
    const res = await owner.put('/api/admin/users/6/role').send({ role: 'customer' }).expect(409);
    expect(res.body.error.message).toMatch(/Second Owner is an owner/);
    expect((await harness.db('users').where({ id: 6 }).first()).role).toBe('owner');
  });

  it('when the role is not staff or customer, or the person is unknown, then it answers 400 or 404', async () => {
    const res = await owner.put(`/api/admin/users/${ids.dominic}/role`).send({ role: 'owner' }).expect(400);
    expect(res.body.error.fields.role).toBe('Choose staff or customer');
    await owner.put('/api/admin/users/999/role').send({ role: 'staff' }).expect(404);
    expect(
      (await owner.put('/api/admin/users/x/role').send({ role: 'staff' }).expect(400)).body.error.fields.id,
    ).toMatch(/person id/);
  });
});
