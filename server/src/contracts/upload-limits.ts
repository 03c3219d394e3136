/**
 * What an uploaded picture may be, shared by the server's checks and the apps' wording. A raster is refused past
 * the pixel budget from its header, before it is decoded; an SVG's declared size and its drawing are capped so
 * that neither a database column nor a stitch estimate can be made to overflow or stall.
 */

/** Decoding costs 4 bytes a pixel: 25 megapixels is 100 MB, more than any photo of a drawing needs. */
export const MAX_RASTER_MEGAPIXELS = 25;
/** An SVG's width and height (or its viewBox's), in px. */
export const MAX_SVG_SIDE_PX = 10_000;
/** Every number of an SVG's viewBox, in its own units. */
export const MAX_SVG_VIEWBOX_UNITS = 1_000_000;
