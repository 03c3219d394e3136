import { useQueryClient } from '@tanstack/react-query';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { overviewQuery } from '../../features/overview/api/get-overview.ts';
import { useSettings } from '../../features/settings/api/get-settings.ts';
import { SettingsForm } from '../../features/settings/components/settings-form.tsx';
import { useShippingSettings } from '../../features/settings/api/get-shipping-settings.ts';
import { ShippingSettingsForm } from '../../features/settings/components/shipping-settings-form.tsx';

export function SettingsPage() {
  const settings = useSettings();
  const queryClient = useQueryClient();
  if (settings.isPending) return <Loading label="Opening the settings…" />;
  if (settings.isError) return <ErrorNotice message={settings.error.message} onRetry={() => void settings.refetch()} />;
  return (
    <div className="grid min-w-0 max-w-3xl gap-6">
      <div>
        <h1 className="text-2xl font-semibold">Settings</h1>
        <p className="text-sm text-walnut-500">
          How fast the studio works: machine time on every quote, due dates and the capacity chart come from here.
        </p>
      </div>
      <section className="rounded-card border border-linen-200 bg-white p-5">
        {/* Capacity and lead time feed Today's figures, so they are fetched afresh after a save. */}
        <SettingsForm
          settings={settings.data.settings}
          canEdit={settings.data.canEdit}
          onSaved={() => void queryClient.invalidateQueries({ queryKey: overviewQuery().queryKey })}
        />
      </section>
      <section aria-labelledby="shipping-heading" className="rounded-card border border-linen-200 bg-white p-5">
        <h2 id="shipping-heading" className="mb-3 text-lg font-semibold">
          Delivery and pick-up
        </h2>
        <ShippingSettingsSection />
      </section>
    </div>
  );
}

/** The shipping rates load on their own, so the rest of the page does not wait for them. */
function ShippingSettingsSection() {
  const shipping = useShippingSettings();
  if (shipping.isPending) return <Loading label="Opening delivery and pick-up…" />;
  if (shipping.isError) return <ErrorNotice message={shipping.error.message} onRetry={() => void shipping.refetch()} />;
  return <ShippingSettingsForm settings={shipping.data.settings} canEdit={shipping.data.canEdit} />;
}
