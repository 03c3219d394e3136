import { readFileSync } from 'node:fs';

/** A text file shipped with the seeds: seeds/<folder>/<name> (artwork, garment outlines, customer uploads). */
export function readSeedFile(folder: 'artwork' | 'garments' | 'uploads', name: string): string {
  return readFileSync(new URL(`../${folder}/${name}`, import.meta.url), 'utf8');
}
