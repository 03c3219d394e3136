import type { MailStatus } from '@server/contracts/admin-outbox.ts';

const look: Record<MailStatus, { label: string; className: string }> = {
  sent: { label: 'Sent', className: 'bg-sage-50 text-sage-700' },
  queued: { label: 'Waiting to send', className: 'bg-saffron-100 text-walnut-900' },
  retrying: { label: 'Will try again', className: 'bg-saffron-100 text-walnut-900 border border-saffron-500/50' },
  failed: { label: 'Failed', className: 'bg-madder-50 text-madder-700 border border-madder-500/40' },
};

export const mailStatusLabel = (status: MailStatus) => look[status].label;

export function MailStatusBadge({ status }: { status: MailStatus }) {
  return (
    <span className={`whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium ${look[status].className}`}>
      {look[status].label}
    </span>
  );
}
