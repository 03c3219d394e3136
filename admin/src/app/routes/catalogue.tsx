import { useState } from 'react';
import type { StudioFont, StudioHoop, StudioMotif, StudioThread } from '@server/contracts/admin-catalogue.ts';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useStudioCatalogue } from '../../features/catalogue/api/get-studio-catalogue.ts';
import { useStudioGarments } from '../../features/catalogue/api/get-studio-garments.ts';
import type { CatalogueKind } from '../../features/catalogue/api/save-catalogue-row.ts';
import { CataloguePanel } from '../../features/catalogue/components/catalogue-panel.tsx';
import { ColourForm } from '../../features/catalogue/components/colour-form.tsx';
import { EditorDialog } from '../../features/catalogue/components/editor-dialog.tsx';
import { FontForm } from '../../features/catalogue/components/font-form.tsx';
import { smallButtonClassName } from '../../features/catalogue/components/form-field.tsx';
import { GarmentForm } from '../../features/catalogue/components/garment-form.tsx';
import { GarmentList, type GarmentEditRequest } from '../../features/catalogue/components/garment-list.tsx';
import { HoopFields } from '../../features/catalogue/components/hoop-fields.tsx';
import { HoopForm } from '../../features/catalogue/components/hoop-form.tsx';
import { LetteringSamples } from '../../features/catalogue/components/lettering-samples.tsx';
import { MotifForm } from '../../features/catalogue/components/motif-form.tsx';
import { MotifTable } from '../../features/catalogue/components/motif-table.tsx';
import { RetireControl } from '../../features/catalogue/components/retire-control.tsx';
import { SizeForm } from '../../features/catalogue/components/size-form.tsx';
import { ThreadForm } from '../../features/catalogue/components/thread-form.tsx';
import { ThreadPalette } from '../../features/catalogue/components/thread-palette.tsx';

/** Which form is open: a new row (no row given) or an edit. */
type OpenForm =
  | { form: 'none' }
  | GarmentEditRequest
  | { form: 'new-garment' }
  | { form: 'motif'; motif?: StudioMotif }
  | { form: 'font'; font?: StudioFont }
  | { form: 'thread'; thread?: StudioThread }
  | { form: 'hoop'; hoop?: StudioHoop };

const sections = [
  { id: 'garments', label: 'Garments' },
  { id: 'motifs', label: 'Motifs' },
  { id: 'lettering', label: 'Lettering' },
  { id: 'threads', label: 'Threads' },
  { id: 'hoops', label: 'Hoops' },
];

function formTitle(open: OpenForm): string {
  switch (open.form) {
    case 'none':
      return '';
    case 'new-garment':
      return 'Add a garment';
    case 'garment':
      return `Edit ${open.garment.name}`;
    case 'size':
      return open.size ? `Edit size ${open.size.label} of ${open.garment.name}` : `Add a size to ${open.garment.name}`;
    case 'colour':
      return open.colour ? `Edit ${open.colour.name}` : `Add a colour to ${open.garment.name}`;
    case 'motif':
      return open.motif ? `Edit ${open.motif.name}` : 'Add a motif';
    case 'font':
      return open.font ? `Edit ${open.font.name}` : 'Add a lettering font';
    case 'thread':
      return open.thread ? `Edit ${open.thread.name}` : 'Add a thread';
    case 'hoop':
      return open.hoop ? `Edit ${open.hoop.name}` : 'Add a hoop';
  }
}

/** Edit and retire, for one row of a list. */
function RowActions({
  kind,
  row,
  onEdit,
}: {
  kind: CatalogueKind;
  row: { id: number; name: string; isActive: boolean };
  onEdit: () => void;
}) {
  return (
    <>
      <button type="button" className={smallButtonClassName} aria-label={`Edit ${row.name}`} onClick={onEdit}>
        Edit
      </button>
      <RetireControl kind={kind} id={row.id} name={row.name} isActive={row.isActive} />
    </>
  );
}

export function CataloguePage() {
  const catalogue = useStudioCatalogue();
  const garments = useStudioGarments();
  const [open, setOpen] = useState<OpenForm>({ form: 'none' });
  const close = () => setOpen({ form: 'none' });
  const threads = catalogue.data?.threads ?? [];

  return (
    <div className="grid min-w-0 gap-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h1 className="text-2xl font-semibold">Catalogue</h1>
        <nav aria-label="Catalogue sections" className="flex flex-wrap gap-1 text-sm">
          {sections.map((section) => (
            <a
              key={section.id}
              href={`#${section.id}`}
              className="rounded-full border border-linen-300 bg-white px-3 py-1.5 hover:bg-linen-100"
            >
              {section.label}
            </a>
          ))}
        </nav>
      </div>

      <CataloguePanel
        id="garments"
        title="Garments"
        note="Retired garments leave the shop; designs and orders made on them keep them."
        addLabel="Add garment"
        onAdd={() => setOpen({ form: 'new-garment' })}
      >
        {garments.isPending ? (
          <Loading label="Opening the garments…" />
        ) : garments.isError ? (
          <ErrorNotice message={garments.error.message} onRetry={() => void garments.refetch()} />
        ) : garments.data.garments.length ? (
          <GarmentList garments={garments.data.garments} onEdit={setOpen} />
        ) : (
          <EmptyState title="No garments yet.">Add the first garment the shop embroiders.</EmptyState>
        )}
      </CataloguePanel>

      {catalogue.isPending ? (
        <Loading label="Opening the catalogue…" />
      ) : catalogue.isError ? (
        <ErrorNotice message={catalogue.error.message} onRetry={() => void catalogue.refetch()} />
      ) : (
        <>
          <CataloguePanel
            id="motifs"
            title="Motifs"
            note="Quotes scale each motif's stitch count with its size: the studio's measured count where there is one, else the engine's estimate."
            addLabel="Add motif"
            onAdd={() => setOpen({ form: 'motif' })}
          >
            {catalogue.data.motifs.length ? (
              <MotifTable
                motifs={catalogue.data.motifs}
                threads={threads}
                renderActions={(motif) => (
                  <span className="flex flex-col gap-1">
                    <RowActions kind="motifs" row={motif} onEdit={() => setOpen({ form: 'motif', motif })} />
                  </span>
                )}
              />
            ) : (
              <EmptyState title="No motifs yet.">Upload a motif's artwork to add it.</EmptyState>
            )}
          </CataloguePanel>
          <div className="grid gap-6 lg:grid-cols-2">
            <CataloguePanel
              id="lettering"
              title="Lettering"
              note="Only fonts shipped with the shop can be offered."
              addLabel="Add font"
              onAdd={() => setOpen({ form: 'font' })}
            >
              {catalogue.data.fonts.length ? (
                <LetteringSamples
                  fonts={catalogue.data.fonts}
                  renderActions={(font) => (
                    <RowActions kind="fonts" row={font} onEdit={() => setOpen({ form: 'font', font })} />
                  )}
                />
              ) : (
                <EmptyState title="No lettering fonts yet." />
              )}
            </CataloguePanel>
            <CataloguePanel
              id="hoops"
              title="Hoops"
              note="Sewing fields, drawn to the same scale."
              addLabel="Add hoop"
              onAdd={() => setOpen({ form: 'hoop' })}
            >
              {catalogue.data.hoops.length ? (
                <HoopFields
                  hoops={catalogue.data.hoops}
                  renderActions={(hoop) => (
                    <RowActions kind="hoops" row={hoop} onEdit={() => setOpen({ form: 'hoop', hoop })} />
                  )}
                />
              ) : (
                <EmptyState title="No hoops yet." />
              )}
            </CataloguePanel>
          </div>
          <CataloguePanel
            id="threads"
            title="Thread palette"
            note={`${threads.filter((t) => t.isActive).length} colours on the shelf.`}
            addLabel="Add thread"
            onAdd={() => setOpen({ form: 'thread' })}
          >
            {threads.length ? (
              <ThreadPalette
                threads={threads}
                renderActions={(thread) => (
                  <RowActions kind="threads" row={thread} onEdit={() => setOpen({ form: 'thread', thread })} />
                )}
              />
            ) : (
              <EmptyState title="No threads yet." />
            )}
          </CataloguePanel>
        </>
      )}

      <EditorDialog title={formTitle(open)} isOpen={open.form !== 'none'} onClose={close}>
        {open.form === 'new-garment' && <GarmentForm onDone={close} />}
        {open.form === 'garment' && <GarmentForm garment={open.garment} onDone={close} />}
        {open.form === 'size' && <SizeForm garment={open.garment} size={open.size} onDone={close} />}
        {open.form === 'colour' && <ColourForm garmentId={open.garment.id} colour={open.colour} onDone={close} />}
        {open.form === 'motif' && <MotifForm motif={open.motif} threads={threads} onDone={close} />}
        {open.form === 'font' && <FontForm font={open.font} onDone={close} />}
        {open.form === 'thread' && <ThreadForm thread={open.thread} onDone={close} />}
        {open.form === 'hoop' && <HoopForm hoop={open.hoop} onDone={close} />}
      </EditorDialog>
    </div>
  );
}
