import type { ButtonHTMLAttributes, AnchorHTMLAttributes } from 'react';

type Tone = 'primary' | 'quiet';

const tones: Record<Tone, string> = {
  primary: 'bg-madder-600 text-white hover:bg-madder-700 shadow-sm',
  quiet: 'bg-white text-walnut-900 border border-linen-300 hover:bg-linen-100',
};

const base =
  'inline-flex min-h-11 items-center justify-center gap-2 rounded-full px-5 py-2.5 font-medium transition-colors disabled:opacity-60';

/** The button look, for a router link that should read as an action. */
export const buttonClassName = (tone: Tone = 'primary') => `${base} ${tones[tone]}`;

export function Button({
  tone = 'primary',
  className = '',
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone }) {
  return <button type="button" className={`${buttonClassName(tone)} ${className}`} {...props} />;
}

/** A link styled as a button, for navigation that leaves the app (sign-in goes through the server). */
export function ButtonLink({
  tone = 'primary',
  className = '',
  ...props
}: AnchorHTMLAttributes<HTMLAnchorElement> & { tone?: Tone }) {
  return <a className={`${buttonClassName(tone)} ${className}`} {...props} />;
}
