/**
 * The two bodies of every e-mail the server sends: plain text, and a light HTML copy of the same paragraphs with
 * web addresses made into links. Nothing else goes in the HTML, so a customer's words cannot inject markup.
 */
const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const WEB_ADDRESS = /https?:\/\/[^\s<>"']+/g;

function paragraphHtml(paragraph: string): string {
  let html = '';
  let at = 0;
  for (const match of paragraph.matchAll(WEB_ADDRESS)) {
    html += escapeHtml(paragraph.slice(at, match.index));
    html += `<a href="${escapeHtml(match[0])}">${escapeHtml(match[0])}</a>`;
    at = match.index + match[0].length;
  }
  return `<p>${html}${escapeHtml(paragraph.slice(at))}</p>`;
}

export function mailBodies(paragraphs: readonly string[]): { text: string; html: string } {
  return { text: paragraphs.join('\n\n'), html: paragraphs.map(paragraphHtml).join('\n') };
}

/** The customer's page for an order on the storefront, which e-mails and the payment page send them back to. */
export const orderPageUrl = (appOrigin: string, number: string) => `${appOrigin}/orders/${encodeURIComponent(number)}`;

/** The studio's page for an order in the studio app: e-mails to the studio link here, not to the storefront. */
export const studioOrderPageUrl = (appOrigin: string, number: string) =>
  `${appOrigin}/admin/orders/${encodeURIComponent(number)}`;
