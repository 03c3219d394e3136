import { useEffect } from 'react';

/**
 * Declares the lettering faces when a page first shows lettering. The stylesheet comes as its own chunk, and the
 * browser then fetches only the faces that text is actually set in, so the catalogue's other pages stay light.
 */
export const loadLetteringFaces = () => import('./lettering-faces.ts');

/** Declares the lettering faces once the component shows lettering (`isShown`). */
export function useLetteringFaces(isShown: boolean): void {
  useEffect(() => {
    if (isShown) void loadLetteringFaces();
  }, [isShown]);
}
