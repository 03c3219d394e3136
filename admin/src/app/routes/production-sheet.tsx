import { useState, type ReactNode } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { PaperSize, ProductionSheet, SheetPlacement } from '@server/contracts/production-sheet.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button, ButtonLink } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatLength, formatStudioDate } from '@ui/format.ts';
import {
  productionSheetPdfHref,
  useProductionSheet,
} from '../../features/production-sheet/api/get-production-sheet.ts';
import { HemPlanPicture } from '../../features/production-sheet/components/hem-plan-picture.tsx';
import { PlacementDetails } from '../../features/production-sheet/components/placement-details.tsx';
import { SewingOrderList } from '../../features/production-sheet/components/sewing-order-list.tsx';
import { CheckSquare, TrueSizeTemplate } from '../../features/production-sheet/components/true-size-template.tsx';
import '../../features/production-sheet/production-sheet-print.css';
import { statusLabels } from '../../lib/order-status-labels.ts';
import { paths } from '../../config/paths.ts';

const papers: { value: PaperSize; label: string }[] = [
  { value: 'letter', label: 'Letter' },
  { value: 'a4', label: 'A4' },
];

/** The paper less 10 mm margins (the print CSS's @page margin), mm: Letter is 215.9 × 279.4 mm, A4 210 × 297 mm. */
const printableWidthMm: Record<PaperSize, number> = { letter: 195.9, a4: 190 };
const printableHeightMm: Record<PaperSize, number> = { letter: 259.4, a4: 277 };

const mm1 = (mm: number) => `${Number(Math.abs(mm).toFixed(1))} mm`;
/** The inch half of formatLength ("3 ⅜ in"), for figures shown in mm to a tenth. */
const inchesOf = (mm: number) => formatLength(Math.abs(mm)).split(' · ')[1];
const minutes = (value: number) => {
  const rounded = Math.round(value);
  return rounded < 60 ? `${rounded} min` : `${Math.floor(rounded / 60)} h ${rounded % 60} min`;
};

function Section({ title, children, className = '' }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section className={`min-w-0 rounded-card border border-linen-200 bg-white p-5 ${className}`}>
      <h2 className="mb-3 text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

export function ProductionSheetPage() {
  const { number = '' } = useParams();
  const [paper, setPaper] = useState<PaperSize>('letter');
  const sheet = useProductionSheet(number);
  const back = (
    <Link to={paths.order.href(number)} className="screen-only text-sm text-walnut-500 hover:text-madder-600">
      ← Order {number}
    </Link>
  );
  if (sheet.isPending) return <Loading label={`Preparing the production sheet for ${number}…`} />;
  if (sheet.isError) {
    const isExpected =
      sheet.error instanceof ApiError && (sheet.error.kind === 'conflict' || sheet.error.kind === 'not-found');
    return (
      <div className="grid gap-4">
        {back}
        <h1 className="text-2xl font-semibold">Production sheet · {number}</h1>
        {isExpected ? (
          <div role="alert" className="max-w-2xl rounded-card border border-saffron-500/50 bg-saffron-100 p-5">
            <p className="font-medium">No production sheet yet</p>
            <p className="mt-1 text-walnut-700">{sheet.error.message}</p>
          </div>
        ) : (
          <ErrorNotice message={sheet.error.message} onRetry={() => void sheet.refetch()} />
        )}
      </div>
    );
  }
  const data = sheet.data;
  return (
    <div className="production-sheet grid gap-6" data-paper={paper}>
      <div className="grid gap-3">
        {back}
        <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
          <h1 className="text-2xl font-semibold">Production sheet · {data.order.number}</h1>
          <span className="rounded-full bg-sage-50 px-3 py-1 text-sm font-medium text-sage-700">
            {statusLabels[data.order.status]}
          </span>
        </div>
        <p className="text-walnut-700">
          {data.order.designName} for {data.order.customerName}
          {data.order.neededBy && (
            <>
              {' '}
              · needed by <strong>{formatStudioDate(data.order.neededBy)}</strong>
            </>
          )}
        </p>
        {data.order.customerNote && (
          <p className="max-w-2xl rounded-lg bg-saffron-100 p-3 text-sm">“{data.order.customerNote}”</p>
        )}
        {data.order.approvalNotes && (
          <section
            aria-labelledby="approval-notes"
            className="max-w-2xl rounded-lg border border-saffron-500 bg-saffron-100 p-3 text-sm"
          >
            <h2 id="approval-notes" className="font-semibold">
              Customer notes on the approved proof {data.order.approvalNotes.proofVersion}
            </h2>
            {data.order.approvalNotes.comment && <p className="mt-1">“{data.order.approvalNotes.comment}”</p>}
            {data.order.approvalNotes.pins.length > 0 && (
              <ol className="mt-1 list-decimal pl-5">
                {data.order.approvalNotes.pins.map((pin, index) => (
                  <li key={index}>{pin}</li>
                ))}
              </ol>
            )}
          </section>
        )}
        <div className="screen-only flex flex-wrap items-center gap-3">
          <fieldset className="flex items-center gap-1 rounded-full border border-linen-300 bg-white p-1">
            <legend className="sr-only">Paper size</legend>
            {papers.map((option) => (
              <label
                key={option.value}
                className={`cursor-pointer rounded-full px-4 py-1.5 text-sm has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-saffron-500 ${paper === option.value ? 'bg-walnut-900 text-linen-100' : ''}`}
              >
                <input
                  type="radio"
                  name="paper"
                  value={option.value}
                  checked={paper === option.value}
                  onChange={() => setPaper(option.value)}
                  className="sr-only"
                />
                {option.label}
              </label>
            ))}
          </fieldset>
          <ButtonLink href={productionSheetPdfHref(data.order.number, paper)} download>
            Download PDF
          </ButtonLink>
          <Button tone="quiet" onClick={() => window.print()}>
            Print this page
          </Button>
        </div>
      </div>

      <Garment sheet={data} />
      {data.placements.map(
        (placement) =>
          placement.border && <HoopingPlan key={placement.id} placement={placement} border={placement.border} />,
      )}
      <Section title="Stitching order">
        <SewingOrderList sewingOrder={data.sewingOrder} />
      </Section>
      <Section title="Placements and threads">
        <div className="grid gap-5 md:grid-cols-2">
          {data.placements.map((placement) => (
            <PlacementDetails key={placement.id} placement={placement} />
          ))}
        </div>
      </Section>
      <Materials sheet={data} />
      <Section title="Safety cautions">
        <p className="mb-2 text-sm text-walnut-500">Guidance only: follow the regulations where the garment is sold.</p>
        <ul className="grid gap-2 text-sm">
          {data.cautions.map((caution) => (
            <li key={caution.code}>
              <strong className="font-semibold">{caution.title}:</strong> {caution.text}
            </li>
          ))}
        </ul>
      </Section>
      {data.templates.map((template) => (
        <section
          key={template.id}
          className="sheet-template grid min-w-0 gap-3 rounded-card border border-linen-200 bg-white p-5"
        >
          <div>
            <h2 className="text-lg font-semibold">Template · {template.title}</h2>
            <p className="text-sm text-walnut-500">{template.subtitle}</p>
            {(template.widthMm > printableWidthMm[paper] || template.heightMm > printableHeightMm[paper]) && (
              <p className="screen-only text-xs text-walnut-500">
                Larger than the paper: print it from the PDF, which splits it into overlapping tiles.
              </p>
            )}
          </div>
          <div className="template-frame overflow-x-auto">
            <TrueSizeTemplate template={template} />
          </div>
          <CheckSquare />
        </section>
      ))}
    </div>
  );
}

function Garment({ sheet }: { sheet: ProductionSheet }) {
  const { garment, order } = sheet;
  return (
    <Section title="Garment">
      <div className="flex items-center gap-4">
        <span
          aria-hidden="true"
          className="print-colour inline-block h-12 w-12 shrink-0 rounded-lg border border-walnut-700"
          style={{ backgroundColor: garment.colourHex }}
        />
        <p>
          <strong className="font-semibold">{garment.name}</strong> · size {garment.sizeLabel} · {garment.colourName}
          <span className="block text-sm text-walnut-500">
            {garment.fabricType} fabric · {order.quantity} to make
          </span>
        </p>
      </div>
    </Section>
  );
}

function HoopingPlan({
  placement,
  border,
}: {
  placement: SheetPlacement;
  border: NonNullable<SheetPlacement['border']>;
}) {
  return (
    <Section title={`Hooping plan · ${placement.label}`}>
      <p className="mb-3 text-sm text-walnut-700">
        {border.count} repeats of {formatLength(border.repeatWidthMm)} at {border.scalePct} %{' '}
        {border.isClosed ? 'round the' : 'along the front of the'} {formatLength(border.runLengthMm)} hem:{' '}
        {border.hoopings.length} hoopings in the {placement.hoop?.name ?? 'hoop'}
        {border.isRotated && ' (design turned 90° in the hoop)'}. Mark the centre front and a guide line{' '}
        {formatLength(border.hemOffsetMm)} above the hem edge.
      </p>
      <p className="mb-3 text-sm text-walnut-700">
        {border.orderRule} {border.clearanceNote}
      </p>
      <HemPlanPicture border={border} />
      <p className="mt-1 text-xs text-walnut-500">
        Circled numbers are the stitching order; figures below them are mm from the centre mark (minus: left as you face
        the front).
      </p>
      <ol className="mt-3 grid gap-1 text-sm">
        {border.hoopings.map((hooping) => (
          <li key={hooping.order} className="flex flex-wrap gap-x-2">
            <strong className="font-semibold">Hooping {hooping.order}</strong>
            <span>
              repeat{hooping.repeatNumbers.length === 1 ? '' : 's'} {hooping.repeatNumbers.join(', ')}: hoop centre{' '}
              {Math.abs(hooping.fromCentreMm) < 0.05
                ? 'on the centre mark'
                : `${mm1(hooping.fromCentreMm)} (${inchesOf(hooping.fromCentreMm)}) ${hooping.fromCentreMm < 0 ? 'left' : 'right'} of the centre mark`}
            </span>
          </li>
        ))}
      </ol>
    </Section>
  );
}

function Materials({ sheet }: { sheet: ProductionSheet }) {
  const { stabilizer, needle, runMinutes, totals, order } = sheet;
  return (
    <Section title="Stabilizer, needle and machine time">
      <dl className="grid gap-3 text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="font-semibold">Backing</dt>
        <dd>
          {stabilizer.backingName}{' '}
          <span className="text-walnut-500">
            (a {stabilizer.density} design, {stabilizer.densityStitchesPerCm2.toFixed(0)} stitches per cm²)
          </span>
          <ul className="mt-1 grid gap-1 text-walnut-700">
            {stabilizer.messages.map((message) => (
              <li key={message.code}>
                <strong className="font-medium">{message.title}:</strong> {message.text}
              </li>
            ))}
          </ul>
        </dd>
        <dt className="font-semibold">Topping</dt>
        <dd>{stabilizer.toppingName}</dd>
        <dt className="font-semibold">Needle</dt>
        <dd>
          {needle.size} {needle.point} <span className="text-walnut-500">(rule of thumb)</span> · {needle.note}
        </dd>
        <dt className="font-semibold">Machine time</dt>
        <dd>
          About {minutes(runMinutes.totalMinutes)} per garment with setup ({totals.stitches.toLocaleString('en-US')}{' '}
          stitches, {totals.colourChanges} colour changes, {totals.hoopings} hoopings)
          {order.quantity > 1 && (
            <>
              ; all {order.quantity}: about {minutes(runMinutes.orderMinutes)}
            </>
          )}
          .
          <ul className="mt-1 grid gap-0.5 text-walnut-500">
            {runMinutes.items.map((item) => (
              <li key={item.code}>
                {item.label}: {minutes(item.minutes)}
              </li>
            ))}
          </ul>
        </dd>
      </dl>
    </Section>
  );
}
