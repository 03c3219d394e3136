/**
 * Advice the apps show as it is: plain words for parents and staff. Severity: `info` is good practice,
 * `caution` needs a look, `warning` is a hazard or a legal rule to check.
 */
export type GuidanceSeverity = 'info' | 'caution' | 'warning';

export interface GuidanceMessage {
  /** Stable key for the apps (icons, tests, translations later). */
  code: string;
  severity: GuidanceSeverity;
  title: string;
  text: string;
  /** The situation that triggered the message, in words. */
  appliesWhen: string;
}
