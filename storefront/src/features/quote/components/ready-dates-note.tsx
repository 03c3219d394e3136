import { formatCustomerDate } from '@ui/format.ts';
import { useReadyDates } from '../api/get-ready-dates.ts';

const shortDay = formatCustomerDate;

/** When an order placed today could be ready, from the studio's lead time; nothing shows until the server answers. */
export function ReadyDatesNote({ isRush }: { isRush: boolean }) {
  const ready = useReadyDates();
  if (!ready.data) return null;
  const { earliestReadyDate, earliestRushDate } = ready.data;
  return (
    <p className="mt-3 px-1 text-sm text-walnut-700">
      Ordered today, ready by{' '}
      <strong className="font-semibold">{shortDay(isRush ? earliestRushDate : earliestReadyDate)}</strong>
      {isRush ? ' as a rush' : `, or ${shortDay(earliestRushDate)} as a rush`}.
    </p>
  );
}
