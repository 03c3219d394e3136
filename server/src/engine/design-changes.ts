import type { DesignDocument, DesignPlacement } from '../contracts/designs.ts';

/** The names people read for the catalogue codes a design holds; a code missing here is shown as is. */
export interface DesignNames {
  threads: ReadonlyMap<string, string>;
  fonts: ReadonlyMap<string, string>;
  motifs: ReadonlyMap<string, string>;
  zones: ReadonlyMap<string, string>;
}

/** Moves under half a millimetre are the editor's rounding, not a change anyone would see. */
const SMALLEST_MOVE_MM = 0.5;

const mm = (value: number) => `${Math.round(value)} mm`;
const nameIn = (names: ReadonlyMap<string, string>, code: string) => names.get(code) ?? code;

/** How a placement is named in a sentence: "Name “Clara”", "The bunny", "Your picture", "The hem border". */
function labelOf(placement: DesignPlacement, names: DesignNames): string {
  switch (placement.kind) {
    case 'lettering':
      return `Name “${placement.text}”`;
    case 'motif':
      return `The ${nameIn(names.motifs, placement.motif).toLowerCase()}`;
    case 'artwork':
      return 'Your picture';
    case 'border':
      return 'The hem border';
  }
}

function moveOf(before: DesignPlacement, after: DesignPlacement, zones: ReadonlyMap<string, string>): string[] {
  if (before.kind === 'border' || after.kind === 'border') {
    if (before.kind !== 'border' || after.kind !== 'border') return [];
    const dy = after.hemOffsetMm - before.hemOffsetMm;
    return Math.abs(dy) < SMALLEST_MOVE_MM ? [] : [`moved ${mm(Math.abs(dy))} ${dy > 0 ? 'up' : 'down'}`];
  }
  const parts: string[] = [];
  // Mockup millimetres run from the top left as you face the garment, so a smaller y is higher up.
  const dy = after.centerYMm - before.centerYMm;
  const dx = after.centerXMm - before.centerXMm;
  if (Math.abs(dy) >= SMALLEST_MOVE_MM) parts.push(`${mm(Math.abs(dy))} ${dy < 0 ? 'up' : 'down'}`);
  if (Math.abs(dx) >= SMALLEST_MOVE_MM) parts.push(`${mm(Math.abs(dx))} ${dx < 0 ? 'left' : 'right'}`);
  const moved = parts.length ? [`moved ${parts.join(' and ')}`] : [];
  const turned = after.rotationDeg - before.rotationDeg;
  if (Math.abs(turned) >= 1)
    moved.push(`turned ${Math.round(Math.abs(turned))}° ${turned > 0 ? 'clockwise' : 'anticlockwise'}`);
  if (before.zone !== after.zone) moved.push(`moved to the ${nameIn(zones, after.zone).toLowerCase()}`);
  return moved;
}

function threadChanges(before: DesignPlacement, after: DesignPlacement, names: DesignNames, label: string): string[] {
  const from = before.kind === 'lettering' ? [before.thread] : 'threads' in before ? before.threads : [];
  const to = after.kind === 'lettering' ? [after.thread] : 'threads' in after ? after.threads : [];
  const subject = label.charAt(0).toLowerCase() + label.slice(1);
  return to.flatMap((code, index) =>
    from[index] !== undefined && from[index] !== code
      ? [`Thread of ${subject} changed from ${nameIn(names.threads, from[index])} to ${nameIn(names.threads, code)}`]
      : [],
  );
}

function sizeAndWording(before: DesignPlacement, after: DesignPlacement, names: DesignNames): string[] {
  if (before.kind === 'lettering' && after.kind === 'lettering') {
    return [
      ...(before.text !== after.text ? [`lettering changed from “${before.text}” to “${after.text}”`] : []),
      ...(before.font !== after.font
        ? [`font changed from ${nameIn(names.fonts, before.font)} to ${nameIn(names.fonts, after.font)}`]
        : []),
      ...(Math.abs(before.letterHeightMm - after.letterHeightMm) >= SMALLEST_MOVE_MM
        ? [`letters made ${mm(after.letterHeightMm)} tall instead of ${mm(before.letterHeightMm)}`]
        : []),
    ];
  }
  if (before.kind === 'artwork' && after.kind === 'artwork')
    return Math.abs(before.widthMm - after.widthMm) >= SMALLEST_MOVE_MM
      ? [`made ${mm(after.widthMm)} wide instead of ${mm(before.widthMm)}`]
      : [];
  if ((before.kind === 'motif' && after.kind === 'motif') || (before.kind === 'border' && after.kind === 'border')) {
    const from = before.scalePct ?? 100;
    const to = after.scalePct ?? 100;
    const sized =
      Math.round(from) !== Math.round(to)
        ? [
            `made ${to > from ? 'bigger' : 'smaller'} (${Math.round(to)} % of its drawing instead of ${Math.round(from)} %)`,
          ]
        : [];
    const motif =
      before.motif !== after.motif ? [`changed to the ${nameIn(names.motifs, after.motif).toLowerCase()}`] : [];
    return [...motif, ...sized];
  }
  return [];
}

/**
 * What changed between two versions of a design, in sentences a parent reads on the proof: "Name “Clara” moved
 * 5 mm up", "Thread of the bunny changed from Sky to Sage". Placements are matched by id; one in only one version
 * was added or taken off. Empty when nothing a person would see changed.
 */
export function describeDesignChanges(before: DesignDocument, after: DesignDocument, names: DesignNames): string[] {
  const earlier = new Map(before.placements.map((placement) => [placement.id, placement]));
  const later = new Set(after.placements.map((placement) => placement.id));
  const sentences: string[] = [];
  for (const placement of after.placements) {
    const old = earlier.get(placement.id);
    if (!old || old.kind !== placement.kind) {
      sentences.push(`${labelOf(placement, names)} added`);
      continue;
    }
    const label = labelOf(old, names);
    const edits = [...moveOf(old, placement, names.zones), ...sizeAndWording(old, placement, names)];
    if (edits.length) sentences.push(`${label} ${edits.join(', ')}`);
    sentences.push(...threadChanges(old, placement, names, label));
  }
  for (const placement of before.placements)
    if (!later.has(placement.id)) sentences.push(`${labelOf(placement, names)} taken off`);
  return sentences;
}
