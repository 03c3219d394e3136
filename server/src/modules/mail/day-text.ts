import { customerDateStyle, studioDateStyle } from '../../contracts/date-style.ts';

/** A date in a customer's e-mail, in the storefront's style: "December 18, 2026". */
export const formatCustomerMailDate = (day: string): string => customerDateStyle.date(day);

/** A date in an e-mail or message to the studio, in the studio app's style: "Fri, Dec 18, 2026". */
export const formatStudioMailDate = (day: string): string => studioDateStyle.date(day);
