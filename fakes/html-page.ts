import { createHash } from 'node:crypto';
import type { Response } from 'express';
import { html, SafeHtml } from './html.ts';

// Shared look of the fakes' pages: system fonts only (nothing is fetched from another host), readable at any width.
const BASE_CSS = `
*{box-sizing:border-box}
html{font-family:system-ui,-apple-system,"Segoe UI",sans-serif;color:#2b2a33;background:#f7f3ec;line-height:1.45}
body{margin:0;min-height:100vh;display:flex;flex-direction:column;align-items:center}
.notice{width:100%;padding:.55rem 1rem;text-align:center;font-size:.9rem;font-weight:600;color:#fff;background:var(--accent)}
main{width:min(100% - 2rem,var(--width,30rem));margin:2.5rem 0;padding:2rem;background:#fff;border-radius:1rem;
  box-shadow:0 1px 2px rgb(0 0 0/.06),0 8px 24px rgb(43 42 51/.08)}
h1{margin:0 0 .35rem;font-size:1.45rem;line-height:1.2}
h2{margin:1.6rem 0 .6rem;font-size:1rem}
.lead{margin:0 0 1.2rem;color:#5d5a66}
label{display:block;margin:.8rem 0 .25rem;font-weight:600;font-size:.92rem}
input{width:100%;padding:.65rem .75rem;font:inherit;border:1px solid #cfc9d6;border-radius:.55rem;background:#fff}
input:focus-visible,button:focus-visible,a:focus-visible{outline:3px solid var(--accent);outline-offset:2px}
input[aria-invalid=true]{border-color:#b3261e}
.field-error{margin:.3rem 0 0;color:#b3261e;font-size:.88rem}
.alert{margin:0 0 1rem;padding:.75rem 1rem;border-radius:.6rem;background:#fdecea;color:#8c1d18;font-weight:600}
.primary{display:block;width:100%;margin-top:1.3rem;padding:.8rem 1rem;font:inherit;font-weight:700;color:#fff;
  background:var(--accent);border:0;border-radius:.6rem;cursor:pointer}
.primary:hover{filter:brightness(1.08)}
.muted{color:#6d6976;font-size:.88rem}
a{color:var(--accent)}
`;

/**
 * Sends a self-contained page. The CSP admits exactly the page's own stylesheet (by hash) and nothing else: no
 * scripts, images, fonts or frames. Forms may post to this fake and redirect on to the app's http(s) origin.
 */
export function sendHtmlPage(
  res: Response,
  page: {
    status?: number;
    title: string;
    notice: string;
    accent: string;
    widthRem?: number;
    css: string;
    body: SafeHtml;
  },
): void {
  const css = `:root{--accent:${page.accent};--width:${page.widthRem ?? 30}rem}${BASE_CSS}${page.css}`;
  const styleHash = createHash('sha256').update(css).digest('base64');
  // Stylesheets are constants of the fakes; HTML-escaping them would corrupt their quotes, so they go in as markup.
  const stylesheet = new SafeHtml(css);
  const document = html`<!doctype html>
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>${page.title}</title>
        <style>
          ${stylesheet}
        </style>
      </head>
      <body>
        <div class="notice" role="note">${page.notice}</div>
        <main>${page.body}</main>
      </body>
    </html>`;
  res
    .status(page.status ?? 200)
    .set({
      'Content-Type': 'text/html; charset=utf-8',
      'Content-Security-Policy': `default-src 'none'; style-src 'sha256-${styleHash}'; form-action 'self' http: https:; base-uri 'none'; frame-ancestors 'none'`,
      'X-Content-Type-Options': 'nosniff',
      'Referrer-Policy': 'no-referrer',
      'Cache-Control': 'no-store',
    })
    .send(document.markup);
}
