/**
 * A tagged template that HTML-escapes every interpolated value, so the fakes' pages cannot be broken or scripted
 * by what a caller puts into a URL, a form or an API parameter. Only other `html` fragments pass through as markup.
 */
export class SafeHtml {
  constructor(readonly markup: string) {}
}

type HtmlValue = SafeHtml | string | number | null | undefined | false | readonly HtmlValue[];

const ENTITIES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (char) => ENTITIES[char]);
}

function render(value: HtmlValue): string {
  if (value instanceof SafeHtml) return value.markup;
  if (Array.isArray(value)) return value.map(render).join('');
  if (value === null || value === undefined || value === false) return '';
  return escapeHtml(String(value));
}

export function html(strings: TemplateStringsArray, ...values: HtmlValue[]): SafeHtml {
  return new SafeHtml(strings.reduce((out, part, index) => out + render(values[index - 1] as HtmlValue) + part));
}
