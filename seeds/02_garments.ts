import type { Knex } from 'knex';
import { garments, mockupScale } from './data/garments.ts';
import { scaleZones } from './data/placement-zones.ts';
import { readSeedFile } from './data/seed-files.ts';
import { catalogueStamp } from './data/seed-time.ts';
import { backMockupFiles, sizeMeasurements } from './data/garment-measurements.ts';
import { garmentLandmarks } from './data/garment-landmarks.ts';

export async function seed(knex: Knex): Promise<void> {
  await knex('garments').insert(
    garments.map((garment, index) => ({
      id: garment.id,
      slug: garment.slug,
      name: garment.name,
      kind: garment.kind,
      description: garment.description,
      fabric_type: garment.fabricType,
      is_napped: garment.isNapped,
      min_age_months: garment.ageMonths[0],
      max_age_months: garment.ageMonths[1],
      tie_places: JSON.stringify(garment.safety.tiePlaces),
      drawstring_places: JSON.stringify(garment.safety.drawstringPlaces),
      closure: garment.safety.closure,
      closes_at_neck: garment.safety.closesAtNeck,
      intended_use: garment.safety.intendedUse,
      mockup_svg: readSeedFile('garments', garment.mockupFile),
      mockup_back_svg: backMockupFiles[garment.slug] ? readSeedFile('garments', backMockupFiles[garment.slug]!) : null,
      landmarks: garmentLandmarks[garment.slug] ? JSON.stringify(garmentLandmarks[garment.slug]) : null,
      is_active: true,
      sort_order: index + 1,
      ...catalogueStamp,
    })),
  );
  await knex('garment_sizes').insert(
    garments.flatMap((garment) =>
      garment.sizes.map((size, index) => {
        const scale = mockupScale(garment, size);
        return {
          id: size.id,
          garment_id: garment.id,
          code: size.code,
          label: size.label,
          sort_order: index + 1,
          hem_front_mm: size.hem?.frontMm ?? null,
          hem_circumference_mm: size.hem?.circumferenceMm ?? null,
          mockup_scale: scale.toFixed(4),
          placement_zones: JSON.stringify(scaleZones(garment.zones, scale)),
          min_age_months: size.ageMonths[0],
          max_age_months: size.ageMonths[1],
          chest_mm: sizeMeasurements[size.id]?.chestMm ?? null,
          length_mm: sizeMeasurements[size.id]?.lengthMm ?? null,
          ...catalogueStamp,
        };
      }),
    ),
  );
  await knex('fabric_colours').insert(
    garments.flatMap((garment) =>
      garment.colours.map((colour, index) => ({
        id: colour.id,
        garment_id: garment.id,
        name: colour.name,
        hex: colour.hex,
        sort_order: index + 1,
        ...catalogueStamp,
      })),
    ),
  );
}
