import type { DesignPlacement } from '@server/contracts/designs.ts';
import type { LetteringFontSummary } from '@server/contracts/catalogue.ts';

export interface EditorChoices {
  threads: { code: string; name: string }[];
  fonts: LetteringFontSummary[];
}

const box = 'min-h-11 w-full rounded-lg border border-linen-300 bg-white px-2.5';

function NumberBox({
  label,
  value,
  onChange,
  step = 1,
}: {
  label: string;
  value: number;
  onChange: (value: number) => void;
  step?: number;
}) {
  return (
    <label className="grid gap-1">
      <span className="font-medium">{label}</span>
      <input
        type="number"
        step={step}
        className={box}
        value={Number.isFinite(value) ? Math.round(value * 10) / 10 : ''}
        onChange={(event) => event.target.value !== '' && onChange(Number(event.target.value))}
      />
    </label>
  );
}

function ThreadBox({
  label,
  value,
  choices,
  onChange,
}: {
  label: string;
  value: string;
  choices: EditorChoices;
  onChange: (code: string) => void;
}) {
  return (
    <label className="grid gap-1">
      <span className="font-medium">{label}</span>
      <select className={box} value={value} onChange={(event) => onChange(event.target.value)}>
        {choices.threads.map((thread) => (
          <option key={thread.code} value={thread.code}>
            {thread.name}
          </option>
        ))}
      </select>
    </label>
  );
}

/** A name for the placement a person reads, never its id. */
export function placementTitle(placement: DesignPlacement): string {
  if (placement.kind === 'lettering') return `Name “${placement.text}”`;
  if (placement.kind === 'artwork') return 'The customer’s picture';
  if (placement.kind === 'border') return 'Hem border';
  return 'Motif';
}

/**
 * One placement's boxes: where it sits (mm right of the centre front and down from the top of the garment
 * drawing), its size, its threads and, for lettering, its words and font. Every change is handed up whole.
 */
export function PlacementFields({
  placement,
  centreXMm,
  choices,
  onChange,
}: {
  placement: DesignPlacement;
  centreXMm: number;
  choices: EditorChoices;
  onChange: (placement: DesignPlacement) => void;
}) {
  const title = placementTitle(placement);
  return (
    <fieldset className="grid gap-3 rounded-lg border border-linen-200 p-3 text-sm sm:grid-cols-2">
      <legend className="px-1 font-semibold">{title}</legend>
      {placement.kind === 'border' ? (
        <NumberBox
          label="Height above the hem (mm)"
          value={placement.hemOffsetMm}
          onChange={(hemOffsetMm) => onChange({ ...placement, hemOffsetMm })}
        />
      ) : (
        <>
          <NumberBox
            label="Right of centre front (mm)"
            value={placement.centerXMm - centreXMm}
            onChange={(mm) => onChange({ ...placement, centerXMm: mm + centreXMm })}
          />
          <NumberBox
            label="Down from the top (mm)"
            value={placement.centerYMm}
            onChange={(centerYMm) => onChange({ ...placement, centerYMm })}
          />
        </>
      )}
      {placement.kind === 'artwork' && (
        <NumberBox
          label="Width (mm)"
          value={placement.widthMm}
          onChange={(widthMm) => onChange({ ...placement, widthMm })}
        />
      )}
      {(placement.kind === 'motif' || placement.kind === 'border') && (
        <NumberBox
          label="Size (% of the drawing)"
          value={placement.scalePct ?? 100}
          onChange={(scalePct) => onChange({ ...placement, scalePct })}
        />
      )}
      {placement.kind === 'lettering' && (
        <>
          <label className="grid gap-1">
            <span className="font-medium">Lettering</span>
            <input
              className={box}
              value={placement.text}
              maxLength={40}
              onChange={(event) => onChange({ ...placement, text: event.target.value })}
            />
          </label>
          <label className="grid gap-1">
            <span className="font-medium">Font</span>
            <select
              className={box}
              value={placement.font}
              onChange={(event) => onChange({ ...placement, font: event.target.value })}
            >
              {choices.fonts.map((font) => (
                <option key={font.slug} value={font.slug}>
                  {font.name}
                </option>
              ))}
            </select>
          </label>
          <NumberBox
            label="Letter height (mm)"
            value={placement.letterHeightMm}
            onChange={(letterHeightMm) => onChange({ ...placement, letterHeightMm })}
          />
          <ThreadBox
            label="Thread"
            value={placement.thread}
            choices={choices}
            onChange={(thread) => onChange({ ...placement, thread })}
          />
        </>
      )}
      {(placement.kind === 'motif' || placement.kind === 'border') &&
        placement.threads.map((code, index) => (
          <ThreadBox
            key={index}
            label={placement.threads.length === 1 ? 'Thread' : `Thread ${index + 1}`}
            value={code}
            choices={choices}
            onChange={(thread) =>
              onChange({ ...placement, threads: placement.threads.map((c, i) => (i === index ? thread : c)) })
            }
          />
        ))}
    </fieldset>
  );
}
