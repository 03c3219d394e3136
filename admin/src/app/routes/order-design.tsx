import { Link, useNavigate, useParams } from 'react-router-dom';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useDebouncedValue } from '@ui/hooks/use-debounced-value.ts';
import { showServerErrors } from '@ui/show-server-errors.ts';
import { designDocument, type DesignDocument, type DesignPlacement } from '@server/contracts/designs.ts';
import { sendProofRequest } from '@server/contracts/studio-orders.ts';
import type { OrderDesignResponse } from '@server/contracts/proof-versions.ts';
import {
  useDraftPicture,
  useEditorChoices,
  useOrderDesign,
  usePricedDraft,
} from '../../features/orders/api/order-design.ts';
import { useSendProof } from '../../features/orders/api/send-proof.ts';
import { PlacementFields, type EditorChoices } from '../../features/orders/components/placement-fields.tsx';
import { PriceAgainst } from '../../features/orders/components/price-against.tsx';
import { paths } from '../../config/paths.ts';

const editorFields = z.object({ document: designDocument, message: sendProofRequest.options[0].shape.message });

/** The live picture and price of the draft, both from the server, asked for once the edits settle. */
function DraftPreview({ number, document }: { number: string; document: DesignDocument }) {
  const settled = useDebouncedValue(document, 400);
  const price = usePricedDraft(number, settled);
  const picture = useDraftPicture(number, settled);
  return (
    <div className="grid content-start gap-3">
      {picture.isPending ? (
        <p role="status" className="text-walnut-500">
          Drawing the design on the garment…
        </p>
      ) : picture.isError ? (
        <p role="alert" className="text-madder-700">
          {picture.error.message}
        </p>
      ) : (
        <img
          src={picture.data}
          alt="The changed design drawn on the garment"
          className="w-full rounded-md border border-linen-200"
        />
      )}
      {price.isError ? (
        <p role="alert" className="text-madder-700">
          {price.error.message}
        </p>
      ) : price.data ? (
        <>
          <PriceAgainst price={price.data} />
          <section aria-labelledby="changes-heading" className="text-sm">
            <h2 id="changes-heading" className="font-semibold">
              What changed
            </h2>
            {price.data.changes.length === 0 ? (
              <p className="text-walnut-500">Nothing yet.</p>
            ) : (
              <ul className="list-disc pl-5">
                {price.data.changes.map((change) => (
                  <li key={change}>{change}</li>
                ))}
              </ul>
            )}
          </section>
        </>
      ) : (
        <p role="status" className="text-walnut-500">
          Pricing…
        </p>
      )}
    </div>
  );
}

function Editor({ design, choices }: { design: OrderDesignResponse; choices: EditorChoices }) {
  const navigate = useNavigate();
  const send = useSendProof(design.number, () => undefined);
  const { nextVersion } = design;
  const { watch, setValue, register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(editorFields),
    defaultValues: {
      document: design.document,
      message: 'Here is the design with the change you asked for. Approve it to start stitching.',
    },
  });
  const document = watch('document');
  const change = (index: number, placement: DesignPlacement) =>
    setValue(
      'document',
      { ...document, placements: document.placements.map((p, i) => (i === index ? placement : p)) },
      { shouldDirty: true },
    );
  const submit = handleSubmit((values) =>
    send.mutate(
      { source: 'render', message: values.message, document: values.document },
      {
        onSuccess: () => navigate(paths.order.href(design.number)),
        onError: (error) => showServerErrors(error, setError, ['message', 'document']),
      },
    ),
  );
  return (
    <form onSubmit={submit} noValidate className="grid gap-6 lg:grid-cols-[3fr_2fr]" aria-label="Change the design">
      <div className="grid content-start gap-4">
        {document.placements.map((placement, index) => (
          <PlacementFields
            key={placement.id}
            placement={placement}
            centreXMm={design.mockupWidthMm / 2}
            choices={choices}
            onChange={(next) => change(index, next)}
          />
        ))}
        <label className="grid gap-1 text-sm">
          <span className="font-medium">Note to the customer</span>
          <textarea
            rows={3}
            maxLength={2000}
            className="rounded-lg border border-linen-300 p-2"
            {...register('message')}
          />
          {formState.errors.message && <span className="text-madder-700">{formState.errors.message.message}</span>}
        </label>
        {formState.errors.root?.server && (
          <p role="alert" className="text-madder-700">
            {formState.errors.root.server.message}
          </p>
        )}
        <div>
          <Button type="submit" disabled={send.isPending}>
            {send.isPending ? 'Sending…' : `Send proof ${nextVersion}`}
          </Button>
        </div>
      </div>
      <DraftPreview number={design.number} document={document} />
    </form>
  );
}

/** The studio's editor of an order's design: the change a customer asked for, priced and drawn by the server. */
export function OrderDesignPage() {
  const { number = '' } = useParams();
  const design = useOrderDesign(number);
  const choices = useEditorChoices();
  return (
    <div className="grid gap-4">
      <div>
        <Link to={paths.order.href(number)} className="text-sm text-walnut-500 hover:text-madder-600">
          ← Order {number}
        </Link>
        <h1 className="mt-1 text-2xl font-semibold">Change the design of {number}</h1>
        <p className="text-sm text-walnut-700">
          Move, resize or re-thread what the customer asked about; the price and the drawing follow every change.
        </p>
      </div>
      {design.isPending || choices.isPending ? (
        <Loading label="Opening the design…" />
      ) : design.isError ? (
        <ErrorNotice message={design.error.message} onRetry={() => void design.refetch()} />
      ) : choices.isError ? (
        <ErrorNotice message={choices.error.message} onRetry={() => void choices.refetch()} />
      ) : (
        <Editor design={design.data} choices={choices.data} />
      )}
    </div>
  );
}
