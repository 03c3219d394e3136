/**
 * The studio's hoops by sewing field (the area the machine reaches, smaller than the frame the name rounds), each with
 * 3 mm kept clear at every edge of the field (a few mm is common practice, no source; see the hoops clearance migration).
 */
export const hoops = [
  {
    id: 1,
    slug: 'square-100',
    name: 'Square 100 × 100 mm (4 × 4 in)',
    field_width_mm: 100,
    field_height_mm: 100,
    clearance_mm: 3,
    sort_order: 1,
  },
  {
    id: 2,
    slug: 'oblong-120x180',
    name: 'Oblong 120 × 180 mm (5 × 7 in)',
    field_width_mm: 120,
    field_height_mm: 180,
    clearance_mm: 3,
    sort_order: 2,
  },
  {
    id: 3,
    slug: 'long-160x260',
    name: 'Long 160 × 260 mm (6 × 10 in)',
    field_width_mm: 160,
    field_height_mm: 260,
    clearance_mm: 3,
    sort_order: 3,
  },
  {
    id: 4,
    slug: 'large-200x300',
    name: 'Large 200 × 300 mm (8 × 12 in)',
    field_width_mm: 200,
    field_height_mm: 300,
    clearance_mm: 3,
    sort_order: 4,
  },
];
