/**
 * What each seeded e-mail said, so the studio's outbox has something to read. Short and plain; the live messages
 * come from the server's own templates.
 */
const bodies: Record<string, (orderNumber: string) => string> = {
  order_received: (n) =>
    `Thank you for your order ${n}.\n\nYour card is held, not charged. We will send a proof to approve before a single stitch is sewn.\n\nWren & Bobbin`,
  proof_ready: (n) =>
    `Your proof for ${n} is ready.\n\nOpen it to see the embroidery drawn to scale on the garment, then approve it or tell us what to change.\n\nWren & Bobbin`,
  order_shipped: (n) => `Good news: ${n} is stitched, packed and on its way.\n\nWren & Bobbin`,
  order_cancelled: (n) => `Order ${n} has been cancelled and the hold on your card released.\n\nWren & Bobbin`,
};

const escapeHtml = (text: string) =>
  text.replace(/[&<>"]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;' })[c]!);

/** The text and HTML bodies of a seeded message. */
export function seedMailBodies(template: string, orderNumber: string): { text_body: string; html_body: string } {
  const text = (bodies[template] ?? ((n: string) => `About your order ${n}.`))(orderNumber);
  const html = text
    .split('\n\n')
    .map((paragraph) => `<p>${escapeHtml(paragraph)}</p>`)
    .join('');
  return { text_body: text, html_body: `<!doctype html><html><body>${html}</body></html>` };
}
