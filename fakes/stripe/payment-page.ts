import type { Response } from 'express';
import { html } from '../html.ts';
import { sendHtmlPage } from '../html-page.ts';
import type { CheckoutSessionRecord } from './fake-stripe-state.ts';
import type { CardFieldErrors, CardForm } from './test-cards.ts';

const NOTICE = 'Local test payment page — no real money moves. Only test card numbers work here.';
const ACCENT = '#4b3fb5';

const CSS = `
.layout{display:grid;gap:2rem}
@media (min-width:52rem){.layout{grid-template-columns:1fr 1.1fr}}
.items{list-style:none;margin:0;padding:0}
.item{display:flex;justify-content:space-between;gap:1rem;padding:.55rem 0;border-bottom:1px solid #eee9f2}
.total{display:flex;justify-content:space-between;margin-top:.8rem;font-size:1.15rem;font-weight:700}
.pair{display:grid;grid-template-columns:1fr 1fr;gap:0 1rem}
.hint{margin-top:1.4rem;padding:.75rem 1rem;border-radius:.6rem;background:#f1effb;font-size:.88rem}
.hint code{font-family:ui-monospace,monospace;font-weight:600;white-space:nowrap}
.cancel{display:block;margin-top:1rem;text-align:center}
`;

/** Formats minor units using the currency's own exponent (USD 1000 → $10.00, JPY 500 → ¥500). */
function formatAmount(minorUnits: number, currency: string): string {
  const format = new Intl.NumberFormat('en', { style: 'currency', currency: currency.toUpperCase() });
  return format.format(minorUnits / 10 ** (format.resolvedOptions().maximumFractionDigits ?? 2));
}

function orderSummary(record: CheckoutSessionRecord) {
  const { currency, amount_total: total, customer_email: email } = record.session;
  return html`<section aria-labelledby="summary-title">
    <h2 id="summary-title">Order summary</h2>
    <ul class="items">
      ${record.lineItems.map(
        (item) =>
          html`<li class="item">
            <span>${item.name} × ${item.quantity}</span>
            <span>${formatAmount(item.unitAmount * item.quantity, currency)}</span>
          </li>`,
      )}
    </ul>
    <p class="total"><span>Total</span><span>${formatAmount(total, currency)}</span></p>
    ${email ? html`<p class="muted">Receipt to ${email}</p>` : ''}
  </section>`;
}

function field(
  id: keyof CardForm,
  label: string,
  value: string,
  error: string | undefined,
  attributes: ReturnType<typeof html>,
) {
  return html`<div>
    <label for="${id}">${label}</label>
    <input
      id="${id}"
      name="${id}"
      value="${value}"
      required
      ${attributes}
      aria-invalid="${error ? 'true' : 'false'}"
      ${error ? html` aria-describedby="${id}-error"` : ''}
    />
    ${error ? html`<p class="field-error" id="${id}-error">${error}</p>` : ''}
  </div>`;
}

interface PaymentPageModel {
  record: CheckoutSessionRecord;
  form?: CardForm;
  fieldErrors?: CardFieldErrors;
  decline?: string;
}

/** The hosted page at a session's `url`: the order, a card form, and a way back to the shop. */
export function sendPaymentPage(res: Response, model: PaymentPageModel, status = 200): void {
  const { record, fieldErrors = {} } = model;
  const form = model.form ?? { card_number: '', expiry: '', cvc: '', name: '' };
  const { id, amount_total: total, currency, cancel_url: cancelUrl } = record.session;
  const isSetup = record.session.mode === 'setup';
  const heading = isSetup ? 'Save your card' : `Pay ${formatAmount(total, currency)}`;
  const body = html`<h1>${heading}</h1>
    <p class="lead">
      ${
        isSetup
          ? 'Enter a test card to keep on file. Nothing is taken now; the shop charges it later.'
          : 'Enter a test card to finish this order.'
      }
    </p>
    <div class="layout">
      ${isSetup ? '' : orderSummary(record)}
      <section aria-labelledby="card-title">
        <h2 id="card-title">Card details</h2>
        ${model.decline ? html`<p class="alert" role="alert">${model.decline}</p>` : ''}
        <form method="post" action="/pay/${id}" novalidate>
          ${field('card_number', 'Card number', form.card_number, fieldErrors.card_number, html`inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242" maxlength="23"`)}
          <div class="pair">
            ${field('expiry', 'Expiry (MM/YY)', form.expiry, fieldErrors.expiry, html`inputmode="numeric" autocomplete="cc-exp" placeholder="MM/YY" maxlength="7"`)}
            ${field('cvc', 'CVC', form.cvc, fieldErrors.cvc, html`inputmode="numeric" autocomplete="cc-csc" placeholder="123" maxlength="4"`)}
          </div>
          ${field('name', 'Name on card', form.name, fieldErrors.name, html`autocomplete="cc-name" maxlength="100"`)}
          <button class="primary" type="submit">${heading}</button>
        </form>
        ${cancelUrl ? html`<a class="cancel" href="${cancelUrl}">Cancel and return to the shop</a>` : ''}
        <p class="hint">
          Test cards: <code>4242 4242 4242 4242</code> succeeds, <code>4000 0000 0000 0002</code> is declined,
          <code>4000 0000 0000 9995</code> has insufficient funds, <code>4000 0027 6000 3184</code> is accepted here but
          its bank asks for you again on any later charge. Any future expiry and any three digits.
        </p>
      </section>
    </div>`;
  sendHtmlPage(res, { status, title: 'Test payment', notice: NOTICE, accent: ACCENT, widthRem: 56, css: CSS, body });
}

/** A session already paid: nothing more to do but go back. */
export function sendPaymentCompletePage(res: Response, record: CheckoutSessionRecord): void {
  const body = html`<h1>This payment is complete</h1>
    <p class="lead">
      ${formatAmount(record.session.amount_total, record.session.currency)} was already paid for this order.
    </p>
    <a href="${record.session.success_url.replaceAll('{CHECKOUT_SESSION_ID}', record.session.id)}"
      >Return to the shop</a
    >`;
  sendHtmlPage(res, { status: 409, title: 'Payment complete', notice: NOTICE, accent: ACCENT, css: CSS, body });
}

export function sendPaymentMissingPage(res: Response, sessionId: string): void {
  const body = html`<h1>No such payment</h1>
    <p class="lead">
      There is no checkout session <code>${sessionId}</code> on this test payment service. It may have been started
      before the service restarted; its memory is empty after each start.
    </p>`;
  sendHtmlPage(res, { status: 404, title: 'No such payment', notice: NOTICE, accent: ACCENT, css: CSS, body });
}
