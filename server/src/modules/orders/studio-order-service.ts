import { withPickupNote } from './order-delivery.ts';
import type { Db } from '../../db/knex.ts';
import type { OrderDetailResponse } from '../../contracts/admin-orders.ts';
import type {
  DueOrdersQuery,
  DueOrdersResponse,
  OrderBoardQuery,
  OrderBoardResponse,
} from '../../contracts/studio-orders.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { ArtworkImage, ArtworkService } from '../artwork/artwork-service.ts';
import { listBoardOrders, listDueCandidates, type BoardOrderRow } from './order-board-repo.ts';
import { shopCalendarOf } from '../settings/settings-service.ts';
import { closedOrderStatuses, isIn } from '../../contracts/order-status.ts';
import { dueDateOf, isPastDue, shopDayOf, type ShopCalendar } from '../../engine/index.ts';
import type { BoardOrder } from '../../contracts/studio-orders.ts';

/** A board row with its due date by the one rule, overdue when due before the shop's today and still open. */
function dated(row: BoardOrderRow, schedule: ShopCalendar & { leadTimeDays: number }, today: string): BoardOrder {
  const placedAtMs = row.placedAt === null ? null : Date.parse(row.placedAt);
  const dueDate = dueDateOf({ neededBy: row.neededBy, placedAtMs }, schedule);
  return { ...row, dueDate, isOverdue: isPastDue(dueDate, today) && !isIn(closedOrderStatuses, row.status) };
}
import { readOrderArtworkOwner, readOrderDetail } from './order-detail-repo.ts';
import { readOrderPricingContext } from './order-design-repo.ts';
import { currentDesignOf } from './order-repricing.ts';
import type { GuidanceMessageSummary } from '../../contracts/guidance.ts';
import type { QuoteService } from '../quotes/quote-service.ts';
import { availableOrderActions } from './order-flow.ts';
import { previewCharge } from './charge-preview.ts';

/** What the studio reads about orders: the board, the due-date calendar, one order's page and its customer's pictures. */
export function createStudioOrderService(deps: {
  db: Db;
  artwork: ArtworkService;
  quotes: Pick<QuoteService, 'guidanceFor'>;
  now: () => Date;
}) {
  const { db } = deps;

  /**
   * Where the design the customer last saw (the latest proof's own, else the one ordered) has placements stitched
   * over each other, by the one overlap rule.
   */
  async function layoutNotesOf(number: string): Promise<GuidanceMessageSummary[]> {
    const context = await readOrderPricingContext(db, number);
    if (!context) return [];
    const { garmentId, sizeId, customerId } = context;
    const guidance = await deps.quotes.guidanceFor(
      { garmentId, sizeId, document: currentDesignOf(context).document },
      { userId: customerId },
    );
    return guidance.layoutNotes;
  }
  /** The shop's calendar and its today, in its own time zone: the one "today" of the board and the calendar. */
  async function shopDay() {
    const schedule = await shopCalendarOf(db);
    return { schedule, today: shopDayOf(deps.now().getTime(), schedule.timeZone) };
  }

  return {
    async board(query: OrderBoardQuery): Promise<OrderBoardResponse> {
      const [{ schedule, today }, page] = await Promise.all([shopDay(), listBoardOrders(db, query)]);
      return { ...page, rows: page.rows.map((row) => dated(row, schedule, today)) };
    },

    /** Due in the range or already overdue, soonest first, whether the date was asked for or comes from the lead time. */
    async due(range: DueOrdersQuery): Promise<DueOrdersResponse> {
      const { schedule, today } = await shopDay();
      const orders = (await listDueCandidates(db, range, today))
        .map((row) => dated(row, schedule, today))
        .filter(
          (order) =>
            order.dueDate !== null &&
            ((order.dueDate >= range.from && order.dueDate <= range.to) || order.dueDate < today),
        )
        .sort((a, b) => a.dueDate!.localeCompare(b.dueDate!) || a.number.localeCompare(b.number));
      return { ...range, today, orders };
    },

    async detail(number: string): Promise<Result<OrderDetailResponse>> {
      const detail = await readOrderDetail(db, number);
      if (!detail) return failure('not-found', `There is no order ${number}.`);
      // The studio's buttons follow the state machine; staff and owner may make the same moves. The customer's own
      // moves (paying, asking for changes, approving) are never the studio's to make.
      const studioActions = availableOrderActions(detail.order.status, 'staff').filter(
        (action) => action !== 'authorize' && action !== 'request_changes' && action !== 'approve_proof',
      );
      const delivery = await withPickupNote(db, detail.order.delivery);
      return ok({
        ...detail,
        order: { ...detail.order, delivery },
        studioActions: studioActions as OrderDetailResponse['studioActions'],
        charge: previewCharge(detail, deps.now()),
        layoutNotes: await layoutNotesOf(number),
      });
    },

    /** Only uploads the order's designs place, and only the order's customer's, for the studio to digitize. */
    async artworkImage(number: string, uploadId: number): Promise<Result<ArtworkImage>> {
      const order = await readOrderArtworkOwner(db, number);
      if (!order) return failure('not-found', `There is no order ${number}.`);
      const image = order.uploadIds.includes(uploadId)
        ? await deps.artwork.image({ userId: order.customerId }, uploadId)
        : undefined;
      return image?.ok ? image : failure('not-found', `Order ${number} has no uploaded picture ${uploadId}.`);
    },
  };
}

export type StudioOrderService = ReturnType<typeof createStudioOrderService>;
