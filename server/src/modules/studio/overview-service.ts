import type { Db } from '../../db/knex.ts';
import type { ActionGroupKind, ActionOrder, AdminOverviewResponse } from '../../contracts/admin-overview.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';
import { readOrderOverview } from './order-overview-repo.ts';
import { readCapacitySettings, readMoneyMovements, readOpenOrders, type OpenOrderRow } from './studio-week-repo.ts';
import { bookMachineHours, dueDateOfRow, sumRevenueByWeek } from './studio-weeks.ts';
import { shopCalendarOf } from '../settings/settings-service.ts';
import { readOrdersWithPicturesToDigitize } from './digitizing-repo.ts';
import { addCalendarDays, isPastDue, shopDayOf, weekStartOf } from '../../engine/index.ts';

/** Weeks of machine time shown ahead (this one included) and of takings shown back. */
const weeksAhead = 6;
const weeksBack = 8;
/** An order due within this many days (or overdue) is listed as due soon. */
const dueSoonDays = 7;

/** The groups that are one status each; "due soon" is by date instead. */
const statusOfGroup: Record<Exclude<ActionGroupKind, 'due_soon' | 'pictures_to_digitize'>, OrderStatus> = {
  proofs_to_send: 'authorized',
  changes_asked: 'changes_requested',
  awaiting_charge: 'proof_approved',
  ready_to_ship: 'stitched',
};

/** The studio's home: where every order stands, what needs doing today, machine hours ahead and takings behind. */
export function createOverviewService(deps: { db: Db; now: () => Date }) {
  async function read(): Promise<AdminOverviewResponse> {
    const now = deps.now();
    const schedule = await shopCalendarOf(deps.db);
    // The shop's day, in its own time zone: an order due today is not overdue this evening, whatever UTC says.
    const today = shopDayOf(now.getTime(), schedule.timeZone);
    // Takings from the first shop day of the earliest week shown; a day before that in UTC does no harm, as the
    // weeks themselves are counted in the shop's days.
    const since = new Date(Date.parse(`${addCalendarDays(weekStartOf(today), -7 * (weeksBack - 1) - 1)}T00:00:00Z`));
    const [base, open, money, settings, toDigitize] = await Promise.all([
      readOrderOverview(deps.db, 12),
      readOpenOrders(deps.db),
      readMoneyMovements(deps.db, since),
      readCapacitySettings(deps.db),
      readOrdersWithPicturesToDigitize(deps.db),
    ]);
    const { leadTimeDays } = schedule;
    const soon = addCalendarDays(today, dueSoonDays);

    const toAction = (order: OpenOrderRow): ActionOrder => {
      const dueDate = dueDateOfRow(order, schedule);
      return {
        id: order.id,
        number: order.number,
        customerName: order.customerName,
        status: order.status,
        totalCents: order.totalCents,
        currency: order.currency,
        neededBy: order.neededBy,
        placedAt: order.placedAt?.toISOString() ?? null,
        dueDate,
        isOverdue: isPastDue(dueDate, today),
      };
    };
    const actions = open.map(toAction);
    const inStatus = (kind: keyof typeof statusOfGroup) => ({
      kind,
      orders: actions.filter((order) => order.status === statusOfGroup[kind]),
    });
    const dueSoon = actions
      .filter((order) => order.status !== 'stitched' && order.dueDate !== null && order.dueDate <= soon)
      .sort((a, b) => a.dueDate!.localeCompare(b.dueDate!));

    return {
      ...base,
      today,
      actions: [
        { kind: 'pictures_to_digitize', orders: actions.filter((order) => toDigitize.has(order.id)) },
        inStatus('proofs_to_send'),
        inStatus('changes_asked'),
        inStatus('awaiting_charge'),
        { kind: 'due_soon', orders: dueSoon },
        inStatus('ready_to_ship'),
      ],
      machineHours: {
        capacityHours: settings?.machineHoursPerWeek ?? 0,
        leadTimeDays,
        // Stitched work has left the machine, so only orders before that point book hours.
        weeks: bookMachineHours(
          open.filter((order) => order.status !== 'stitched'),
          { now, weekCount: weeksAhead, schedule },
        ),
      },
      revenue: {
        currency: settings?.currency ?? 'USD',
        weeks: sumRevenueByWeek(money.captures, money.refunds, {
          now,
          weekCount: weeksBack,
          timeZone: schedule.timeZone,
        }),
      },
    };
  }
  return { read };
}

export type OverviewService = ReturnType<typeof createOverviewService>;
