import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { statusLabels } from '../../../admin/src/lib/order-status-labels.ts';
import { shippedWords } from '../../../server/src/contracts/order-status.ts';
import { roleWords } from '../../../server/src/contracts/users.ts';
import { formatCustomerMailDate, formatStudioMailDate } from '../../../server/src/modules/mail/day-text.ts';
import { orderPlacedMail } from '../../../server/src/modules/orders/customer-order-mail.ts';
import { orderShippedMail } from '../../../server/src/modules/orders/studio-order-mail.ts';
import { formatCustomerDate, formatStudioDate } from '../../../ui/src/format.ts';
import { sourcesUnder } from './support/sources-under.ts';

const context = { appOrigin: 'http://127.0.0.1:3000', shopName: 'The studio', number: 'WB-1009', orderId: 9 };
const order = {
  id: 9,
  number: 'WB-1009',
  customerName: 'Priya Example',
  customerEmail: 'priya@example.test',
  currency: 'USD',
  shopName: 'The studio',
};
const appSources = ['storefront/src/', 'admin/src/', 'ui/src/'].flatMap((dir) =>
  sourcesUnder(new URL(`../../../${dir}`, import.meta.url).pathname),
);

describe('dates in e-mails', () => {
  it('when a customer e-mail names a day, then it reads in the storefront style', () => {
    // 15 December 2026 is a Tuesday (1 December 2026 is a Tuesday, as the shop calendar's tests check).
    const mail = orderPlacedMail(context, 'priya@example.test', '$42.00', { date: '2026-12-15', isAskedFor: false });
    expect(mail.text).toContain('ready by December 15, 2026.');
    expect(formatCustomerMailDate('2026-12-15')).toBe(formatCustomerDate('2026-12-15'));
  });

  it('when a studio e-mail names a day, then it reads in the studio app style', () => {
    expect(formatStudioMailDate('2026-12-18')).toBe('Fri, Dec 18, 2026');
    expect(formatStudioMailDate('2026-12-18')).toBe(formatStudioDate('2026-12-18'));
  });
});

describe('one word for a shipped order', () => {
  it('when the order is posted or collected, then the e-mail, the studio board and the storefront use the same words', async () => {
    const posted = orderShippedMail(order, context.appOrigin, {
      method: 'delivery',
      carrier: null,
      trackingNumber: null,
    });
    const collected = orderShippedMail(order, context.appOrigin, {
      method: 'pickup',
      carrier: null,
      trackingNumber: null,
    });
    expect(posted.subject).toBe('WB-1009 has been posted');
    expect(collected.subject).toBe('WB-1009 has been collected');
    expect(statusLabels.shipped).toBe(shippedWords.either);
    const badge = readFileSync(
      new URL('../../../storefront/src/features/orders/components/order-status-badge.tsx', import.meta.url),
      'utf8',
    );
    expect(badge).toContain('shipped: { label: shippedWords.either');
  });

  it('when an app names the shipped state, then it takes the word from shippedWords, not its own', () => {
    const ownWords = appSources.filter((file) =>
      /'(Shipped|Sent|Dispatched|On its way)'|Mark shipped/.test(readFileSync(file, 'utf8')),
    );
    // The outbox's badge names an e-mail's state ("Sent"), not an order's.
    expect(ownWords.map((file) => file.replace(/^.*\/(storefront|admin|ui)\/src\//, '$1/'))).toEqual([
      'admin/features/outbox/components/mail-status-badge.tsx',
    ]);
  });
});

describe('one set of role names', () => {
  it('when a role is shown, then its words come from roleWords and no app keeps its own map', () => {
    expect(roleWords).toEqual({ customer: 'Customer', staff: 'Studio team', owner: 'Studio owner' });
    const ownMaps = appSources.filter((file) => /owner:\s*'[^']*'/.test(readFileSync(file, 'utf8')));
    expect(ownMaps).toEqual([]);
  });
});
