// The shipped lettering fonts' @font-face rules (latin and other subsets, weight 400). Imported only through
// loadLetteringFaces, so their stylesheet is a chunk of its own that pages without lettering never fetch.
import '@fontsource/pacifico/400.css';
import '@fontsource/fredoka/400.css';
import '@fontsource/playfair-display/400.css';
import '@fontsource/great-vibes/400.css';
