import { converter } from 'culori';
import type { Knex } from 'knex';
import { userIds } from './data/accounts.ts';
import { hoops } from './data/hoops.ts';
import { letteringFonts } from './data/lettering-fonts.ts';
import { borderGapMm, motifs } from './data/motifs.ts';
import { readSeedFile } from './data/seed-files.ts';
import { catalogueStamp } from './data/seed-time.ts';
import { threads } from './data/threads.ts';

const toLab = converter('lab65');

export async function seed(knex: Knex): Promise<void> {
  await knex('threads').insert(
    threads.map((thread, index) => {
      const lab = toLab(thread.hex);
      if (!lab) throw new Error(`Seed data: thread ${thread.code} has a bad hex colour`);
      return {
        id: index + 1,
        code: thread.code,
        name: thread.name,
        hex: thread.hex,
        lab_l: lab.l.toFixed(4),
        lab_a: lab.a.toFixed(4),
        lab_b: lab.b.toFixed(4),
        is_active: true,
        sort_order: index + 1,
        ...catalogueStamp,
      };
    }),
  );
  await knex('hoops').insert(hoops.map((hoop) => ({ ...hoop, is_active: true, ...catalogueStamp })));
  await knex('lettering_fonts').insert(letteringFonts.map((font) => ({ ...font, ...catalogueStamp })));
  await knex('motifs').insert(
    motifs.map((motif, index) => ({
      id: motif.id,
      slug: motif.slug,
      name: motif.name,
      kind: motif.kind,
      svg: readSeedFile('artwork', `${motif.slug}.svg`),
      width_mm: motif.widthMm,
      height_mm: motif.heightMm,
      stitch_count: motif.run + motif.satin + motif.fill,
      run_stitches: motif.run,
      satin_stitches: motif.satin,
      fill_stitches: motif.fill,
      colour_count: motif.threadCodes.length,
      min_scale_pct: motif.minScalePct,
      max_scale_pct: motif.maxScalePct,
      gap_mm: borderGapMm,
      default_thread_codes: JSON.stringify(motif.threadCodes),
      // The studio's motifs are all stitches: no appliqué, buttons, bows or beads to come off.
      trims: '[]',
      is_active: true,
      sort_order: index + 1,
      created_by_user_id: userIds.marigold,
      ...catalogueStamp,
    })),
  );
}
