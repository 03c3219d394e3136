// The heavy-work pool's thread entry: Node 20 cannot load TypeScript by itself and a worker thread does not
// inherit the parent's tsx hooks, so each thread registers tsx first and then loads the tasks.
import { register } from 'tsx/esm/api';

register();
const tasks = await import('./heavy-tasks.ts');

export const { warmUp, inspectUpload, inspectArtwork, estimateSvg, renderProof, productionSheetPdf } = tasks;
