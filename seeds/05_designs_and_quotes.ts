import type { Knex } from 'knex';
import { userIds } from './data/accounts.ts';
import { artworkStitchFigures, designFigures } from './data/design-figures.ts';
import { artworkUploads, designs } from './data/designs.ts';
import { buildQuote, quoteSpecs } from './data/quotes.ts';
import { readSeedFile } from './data/seed-files.ts';
import { at } from './data/seed-time.ts';

export async function seed(knex: Knex): Promise<void> {
  await knex('artwork_uploads').insert(
    artworkUploads.map((upload) => {
      const svg = readSeedFile('uploads', upload.file);
      return {
        id: upload.id,
        owner_user_id: userIds[upload.owner],
        original_name: upload.originalName,
        mime_type: 'image/svg+xml',
        byte_size: Buffer.byteLength(svg),
        sanitized_svg: svg,
        png: null,
        width_px: upload.widthPx,
        height_px: upload.heightPx,
        stitch_figures: JSON.stringify(artworkStitchFigures(upload.file)),
        created_at: at(upload.createdAt),
        updated_at: at(upload.createdAt),
      };
    }),
  );
  await knex('designs').insert(
    designs.map((design) => {
      const figures = designFigures(design);
      return {
        id: design.id,
        customer_id: userIds[design.customer],
        garment_id: figures.garment.id,
        garment_size_id: figures.size.id,
        fabric_colour_id: figures.colourId,
        name: design.name,
        document: JSON.stringify(figures.document),
        document_version: figures.document.version,
        share_token: design.shareToken ?? null,
        created_at: at(design.createdAt),
        updated_at: at(design.updatedAt),
      };
    }),
  );
  await knex('quotes').insert(quoteSpecs.map((spec) => buildQuote(spec).row));
}
