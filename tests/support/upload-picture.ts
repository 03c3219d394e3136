import { Jimp, JimpMime } from 'jimp';
import { artworkUploadResponse, type ArtworkUpload } from '../../server/src/contracts/artwork.ts';
import type { ApiAgent } from './api-harness.ts';

/** Uploads a plain PNG of one colour (0xrrggbbaa) as the agent's own picture; resolves with the stored upload. */
export async function uploadPlainPicture(
  agent: ApiAgent,
  size: { width: number; height: number },
  color: number,
): Promise<ArtworkUpload> {
  const png = await new Jimp({ ...size, color }).getBuffer(JimpMime.png);
  const res = await agent
    .post('/api/artwork')
    .attach('file', png, { filename: 'picture.png', contentType: 'image/png' })
    .expect(201);
  return artworkUploadResponse.parse(res.body).artwork;
}
