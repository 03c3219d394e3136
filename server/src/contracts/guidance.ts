import { z } from 'zod';

/** Advice the apps show as it is; severity `info` is good practice, `caution` needs a look, `warning` is a hazard. */
export const guidanceMessage = z.object({
  code: z.string(),
  severity: z.enum(['info', 'caution', 'warning']),
  title: z.string(),
  text: z.string(),
  appliesWhen: z.string(),
});
export type GuidanceMessageSummary = z.infer<typeof guidanceMessage>;

/** Where on a garment ribbon ties or drawstrings are. */
export const cordPlaces = ['hood', 'neck', 'waist'] as const;
/** How a garment fastens. */
export const garmentClosures = ['none', 'snaps', 'buttons', 'hook_and_loop', 'ties', 'zip'] as const;
/** Whether a garment is made to be worn by day or to sleep in (sleepwear has its own fire-safety rules). */
export const garmentUses = ['day_wear', 'sleepwear'] as const;
/** Trims a motif carries beyond stitches, each of which could come off. */
export const motifTrims = ['applique', 'buttons', 'bows', 'beads'] as const;

/** The facts a garment's safety cautions are worked out from, as the studio states them. */
export const garmentSafetyFacts = z.object({
  tiePlaces: z.array(z.enum(cordPlaces, { error: 'Choose hood, neck or waist' })).max(3),
  drawstringPlaces: z.array(z.enum(cordPlaces, { error: 'Choose hood, neck or waist' })).max(3),
  closure: z.enum(garmentClosures, { error: 'Choose how the garment fastens' }),
  closesAtNeck: z.boolean(),
  intendedUse: z.enum(garmentUses, { error: 'Choose day wear or sleepwear' }),
});
export type GarmentSafetyFacts = z.infer<typeof garmentSafetyFacts>;
