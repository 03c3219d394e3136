/** The fields of the hosted payment form, as typed. */
export interface CardForm {
  card_number: string;
  expiry: string;
  cvc: string;
  name: string;
}

export type CardFieldErrors = Partial<Record<keyof CardForm, string>>;

export interface AcceptedCard {
  brand: string;
  last4: string;
  expMonth: number;
  expYear: number;
  holderName: string;
  /** The bank asks for the cardholder on every payment, so a charge made off-session fails with authentication_required. */
  needsAuthenticationOffSession: boolean;
}

export type CardCheck =
  { ok: true; card: AcceptedCard } | { ok: false; fieldErrors: CardFieldErrors; decline?: string };

const USE_THE_TEST_CARD = 'Use 4242 4242 4242 4242 with any future date and any three digits.';
const NEEDS_VERIFICATION = `This test card asks for an extra verification step, which this local page does not imitate. ${USE_THE_TEST_CARD}`;

// Stripe test card numbers: docs.stripe.com/testing (via ../shared/reference/trade-facts.md, "Payments (Stripe)").
const TEST_CARD_DECLINES: Record<string, string> = {
  '4000000000000002': 'Your card was declined.',
  '4000000000009995': 'Your card has insufficient funds.',
  '4000002500003155': NEEDS_VERIFICATION,
  '4000000000003220': NEEDS_VERIFICATION,
};
const SUCCEEDING_TEST_CARD = '4242424242424242';
// "Always authenticate": the card asks for authentication on every payment, however it was saved (Stripe's testing
// docs, 4000 0027 6000 3184, from memory). The customer is on this page, so the step counts as done here; a later
// charge without them (off-session) fails with authentication_required.
const AUTHENTICATE_ALWAYS_TEST_CARD = '4000002760003184';

function passesLuhn(digits: string): boolean {
  let sum = 0;
  for (let offset = 0; offset < digits.length; offset += 1) {
    let digit = Number(digits[digits.length - 1 - offset]);
    if (offset % 2 === 1) digit = digit * 2 > 9 ? digit * 2 - 9 : digit * 2;
    sum += digit;
  }
  return sum % 10 === 0;
}

function checkNumber(typed: string): string | undefined {
  const digits = typed.replace(/\s+/g, '');
  if (digits === '') return 'Enter your card number.';
  if (!/^\d+$/.test(digits) || !passesLuhn(digits)) return 'Your card number is invalid.';
  if (digits.length < 12 || digits.length > 19) return 'Your card number is incomplete.';
  return undefined;
}

/** `MM/YY` (or `MM/YYYY`); a card is good through the last day of its expiry month. */
function parseExpiry(typed: string, nowMs: number): { month: number; year: number } | string {
  const match = /^(\d{1,2})\s*\/\s*(\d{2}|\d{4})$/.exec(typed.trim());
  const month = Number(match?.[1]);
  if (!match || month < 1 || month > 12) return "Enter your card's expiry date as MM/YY.";
  const year = match[2].length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  const now = new Date(nowMs);
  const isPast = year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1);
  return isPast ? "Your card's expiration date is in the past." : { month, year };
}

/** Checks the form like a card form would, then answers as the test card number dictates. */
export function checkTestCard(form: CardForm, nowMs: number): CardCheck {
  const fieldErrors: CardFieldErrors = {};
  const numberError = checkNumber(form.card_number);
  if (numberError) fieldErrors.card_number = numberError;
  const expiry = parseExpiry(form.expiry, nowMs);
  if (typeof expiry === 'string') fieldErrors.expiry = expiry;
  if (!/^\d{3,4}$/.test(form.cvc.trim())) fieldErrors.cvc = "Your card's security code is incomplete.";
  const holderName = form.name.trim();
  if (holderName === '') fieldErrors.name = 'Enter the name on the card.';
  else if (holderName.length > 100) fieldErrors.name = 'Keep the name under 100 characters.';
  if (Object.keys(fieldErrors).length > 0 || typeof expiry === 'string') return { ok: false, fieldErrors };

  const digits = form.card_number.replace(/\s+/g, '');
  if (digits !== SUCCEEDING_TEST_CARD && digits !== AUTHENTICATE_ALWAYS_TEST_CARD) {
    const decline =
      TEST_CARD_DECLINES[digits] ??
      `Your card was declined. This local page takes test cards only. ${USE_THE_TEST_CARD}`;
    return { ok: false, fieldErrors, decline };
  }
  return {
    ok: true,
    card: {
      brand: 'visa',
      last4: digits.slice(-4),
      expMonth: expiry.month,
      expYear: expiry.year,
      holderName,
      needsAuthenticationOffSession: digits === AUTHENTICATE_ALWAYS_TEST_CARD,
    },
  };
}
