import type { PlacementZoneSummary } from '@server/contracts/catalogue.ts';

/** Said when an item is larger than its zone: it is centred there, but part of it would fall outside. */
export function TooBigNote({ zone, advice }: { zone: PlacementZoneSummary; advice: string }) {
  return (
    <p className="rounded-lg bg-saffron-100 p-3 text-sm">
      This is bigger than the space for it (“{zone.label}”), so part of it would fall outside. {advice}
    </p>
  );
}
