import type { DesignPlacement } from '@server/contracts/designs.ts';
import { motifOf, type DesignSetting } from './design-setting.ts';

/** What the customer calls a placement in lists and button names. */
export function placementLabel(setting: DesignSetting, placement: DesignPlacement): string {
  if (placement.kind === 'lettering') return `Name “${placement.text}”`;
  if (placement.kind === 'artwork') return 'Your own artwork';
  const name = motifOf(setting, placement.motif)?.name ?? 'A motif no longer offered';
  return placement.kind === 'border' ? `Border: ${name}` : name;
}
