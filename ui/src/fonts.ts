// Poppins, shipped with the app (no font is fetched from another host).
import '@fontsource/poppins/400.css';
import '@fontsource/poppins/500.css';
import '@fontsource/poppins/600.css';
