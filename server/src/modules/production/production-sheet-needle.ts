import type { FabricConstruction } from '../../engine/index.ts';
import type { ProductionSheet } from '../../contracts/production-sheet.ts';

/**
 * The needle for the garment's fabric: 75/11 for the light knits and wovens children's clothes are made of, a
 * ballpoint on knits so it parts the loops instead of cutting them, a finer 65/9 on sheers. Trade rule of thumb
 * (common practice, no source); the 75/11 needle's 0.75 mm is from Printwear, Feb 2016, p. 61.
 */
export function adviseNeedle(fabric: FabricConstruction, isNapped: boolean): ProductionSheet['needle'] {
  if (fabric === 'knit') {
    return {
      size: '75/11',
      point: 'ballpoint',
      note: 'A ballpoint slips between the knit loops, so the fabric does not run or get holes.',
    };
  }
  if (fabric === 'sheer') {
    return {
      size: '65/9',
      point: 'sharp',
      note: 'A fine sharp needle leaves small holes in sheer fabric; go slower and keep the stitches light.',
    };
  }
  return {
    size: '75/11',
    point: 'sharp',
    note: isNapped
      ? 'A sharp needle pierces the woven pile cleanly; the topping keeps the stitches on top of the loops.'
      : 'A sharp needle pierces the close weave cleanly and keeps satin edges crisp.',
  };
}
