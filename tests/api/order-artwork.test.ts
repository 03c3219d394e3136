import { beforeAll, describe, expect, it } from 'vitest';
import { orderDetailResponse } from '../../server/src/contracts/admin-orders.ts';
import { useApiHarness, type ApiAgent } from '../support/api-harness.ts';
import { signedInAgent } from '../support/api-calls.ts';

const harness = useApiHarness();
let staff: ApiAgent;
beforeAll(async () => {
  staff = await signedInAgent(harness, 'tobias@wrenandbobbin.test');
});

describe('the customer’s own pictures on an order, for the studio', () => {
  it('when staff open an order with an uploaded drawing, then the order page lists it and the picture opens, as a picture only', async () => {
    // WB-1009 places Harriet's granddaughter's sun drawing (upload 1) on the chest.
    const detail = orderDetailResponse.parse((await staff.get('/api/admin/orders/WB-1009').expect(200)).body);
    const [picture] = detail.items[0]!.artwork;
    expect(picture).toMatchObject({
      uploadId: 1,
      zone: 'chest',
      // What the studio reads is the place's name on the romper's size (seeds/data/garments.ts), never its code.
      zoneLabel: 'Chest',
      widthMm: 56,
      imageUrl: '/api/admin/orders/WB-1009/artwork/1/image',
    });
    const image = await staff.get(picture!.imageUrl).expect(200);
    expect(image.headers['content-type']).toMatch(/^image\/(svg\+xml|png)/);
    expect(image.headers['x-content-type-options']).toBe('nosniff');
  });

  it('when the upload is not on that order, or the order does not exist, then it is 404; a malformed id is 400', async () => {
    await staff.get('/api/admin/orders/WB-1001/artwork/1/image').expect(404);
    await staff.get('/api/admin/orders/WB-9999/artwork/1/image').expect(404);
    await staff.get('/api/admin/orders/WB-1009/artwork/one/image').expect(400);
  });

  it('when a customer, even the one who uploaded it, asks through the studio’s route, then it is refused', async () => {
    const harriet = harness.agent();
    await harness.signIn(harriet, 'harriet@example.test');
    await harriet.get('/api/admin/orders/WB-1009/artwork/1/image').expect(403);
  });
});
