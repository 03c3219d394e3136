/**
 * Lettering fonts shipped with the app through @fontsource, each named by its latin 400 .woff in the package's
 * files/; the server's font loader reads every other subset file of that weight beside it (latin-ext, cyrillic…).
 */
export const letteringFonts = [
  {
    id: 1,
    slug: 'breezy-script',
    name: 'Breezy Script',
    font_family: 'Pacifico',
    fontsource_package: '@fontsource/pacifico',
    file_name: 'pacifico-latin-400-normal.woff',
    min_height_mm: 10,
    max_height_mm: 60,
    is_active: true,
    sort_order: 1,
  },
  {
    id: 2,
    slug: 'rounded-block',
    name: 'Rounded Block',
    font_family: 'Fredoka',
    fontsource_package: '@fontsource/fredoka',
    file_name: 'fredoka-latin-400-normal.woff',
    min_height_mm: 8,
    max_height_mm: 60,
    is_active: true,
    sort_order: 2,
  },
  {
    id: 3,
    slug: 'heirloom-serif',
    name: 'Heirloom Serif',
    font_family: 'Playfair Display',
    fontsource_package: '@fontsource/playfair-display',
    file_name: 'playfair-display-latin-400-normal.woff',
    min_height_mm: 8,
    max_height_mm: 50,
    is_active: true,
    sort_order: 3,
  },
  {
    id: 4,
    slug: 'ribbon-script',
    name: 'Ribbon Script',
    font_family: 'Great Vibes',
    fontsource_package: '@fontsource/great-vibes',
    file_name: 'great-vibes-latin-400-normal.woff',
    // Fine script needs taller letters to sew cleanly.
    min_height_mm: 14,
    max_height_mm: 60,
    // Hidden for now: opentype.js 2.0 cannot lay this font out (its GSUB uses chained context substitution format
    // 2). The server's font loader shapes it with fontkit instead, so pricing it works; showing it is the studio's call.
    is_active: false,
    sort_order: 4,
  },
];
