import { useId, useState } from 'react';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { Button } from '@ui/components/button.tsx';
import { useShareDesign } from '../api/share-design.ts';
import { useUnshareDesign } from '../api/unshare-design.ts';

/**
 * The design's read-only link: made on request, copied with one tap, switched off at any time. Whoever has the link
 * sees the design on its garment and nothing about the person who made it.
 */
export function ShareDesignPanel({ design, linkOf }: { design: SavedDesign; linkOf: (shareToken: string) => string }) {
  const linkId = useId();
  const share = useShareDesign();
  const unshare = useUnshareDesign();
  const [copied, setCopied] = useState(false);
  const failure = share.error ?? unshare.error;
  const link = design.shareToken ? linkOf(design.shareToken) : undefined;
  const copy = async (text: string) => {
    try {
      await navigator.clipboard.writeText(text);
      setCopied(true);
    } catch {
      // The clipboard can be refused (permissions, an older browser); the link stays selectable in its field.
      setCopied(false);
    }
  };
  return (
    <div className="space-y-2 rounded-lg bg-linen-100 p-3 text-sm">
      {link ? (
        <>
          <label htmlFor={linkId} className="block font-medium">
            Anyone with this link can look (but not change it)
          </label>
          <input
            id={linkId}
            readOnly
            value={link}
            onFocus={(event) => event.target.select()}
            className="block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3 text-walnut-700"
          />
          <div className="flex flex-wrap items-center gap-2">
            <Button tone="quiet" onClick={() => void copy(link)}>
              Copy link
            </Button>
            <Button
              tone="quiet"
              disabled={unshare.isPending}
              onClick={() => unshare.mutate(design.id, { onSuccess: () => setCopied(false) })}
            >
              {unshare.isPending ? 'Stopping…' : 'Stop sharing'}
            </Button>
            <span role="status" className="text-sage-700">
              {copied ? '✓ Copied' : ''}
            </span>
          </div>
        </>
      ) : (
        <>
          <p className="text-walnut-700">
            Make a link to show this design to family and friends. You can switch it off again.
          </p>
          <Button tone="quiet" disabled={share.isPending} onClick={() => share.mutate(design.id)}>
            {share.isPending ? 'Making the link…' : 'Make a share link'}
          </Button>
        </>
      )}
      {failure && (
        <p role="alert" className="text-madder-700">
          {failure.message}
        </p>
      )}
    </div>
  );
}
