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
import { listBoardOrders, listDueOrders } from './order-board-repo.ts';
import { readOrderArtworkOwner, readOrderDetail } from './order-detail-repo.ts';
import { availableOrderActions } from './order-flow.ts';

/** What the studio reads about orders: the board, the due-date calendar, one order's page and its customer's pictures. */
export function createStudioOrderService(deps: { db: Db; artwork: ArtworkService; now: () => Date }) {
  const { db } = deps;
  const today = () => deps.now().toISOString().slice(0, 10);

  return {
    board: (query: OrderBoardQuery): Promise<OrderBoardResponse> => listBoardOrders(db, query, today()),

    async due(range: DueOrdersQuery): Promise<DueOrdersResponse> {
      return { ...range, today: today(), orders: await listDueOrders(db, range, today()) };
    },

    async detail(number: string): Promise<Result<OrderDetailResponse>> {
      const detail = await readOrderDetail(db, number);
      if (!detail) return failure('not-found', `There is no order ${number}.`);
      // The studio's buttons follow the state machine; staff and owner may make the same moves. The customer's own
      // moves (paying, asking for changes, approving) are never the studio's to make.
      const studioActions = availableOrderActions(detail.order.status, 'staff').filter(
        (action) => action !== 'authorize' && action !== 'request_changes' && action !== 'approve_proof',
      );
      return ok({ ...detail, studioActions: studioActions as OrderDetailResponse['studioActions'] });
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
