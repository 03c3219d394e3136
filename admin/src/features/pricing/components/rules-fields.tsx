import type { ReactNode } from 'react';
import { NumberField } from '../../../components/number-field.tsx';
import { garmentLabel, type MoneyField, type RulesForm } from '../model/rules-form.ts';
import { useSizeLabels } from '../api/get-size-labels.ts';

interface RulesFieldsProps {
  form: RulesForm;
  onChange: (form: RulesForm) => void;
  /** Server messages by rules path, without the leading "rules.". */
  errors: Record<string, string>;
  isReadOnly: boolean;
}

function Group({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <fieldset className="min-w-0 rounded-xl border border-linen-200 p-4">
      <legend className="px-1 font-semibold">{title}</legend>
      {note && <p className="mb-3 text-sm text-walnut-500">{note}</p>}
      <div className="grid gap-3 sm:grid-cols-2">{children}</div>
    </fieldset>
  );
}

/** Every rule of a price list, grouped the way the studio thinks about a job. */
export function RulesFields({ form, onChange, errors, isReadOnly }: RulesFieldsProps) {
  const sizeLabel = useSizeLabels();
  const money = (field: MoneyField, label: string, suffix?: string, hint?: string) => (
    <NumberField
      label={label}
      prefix="$"
      suffix={suffix}
      hint={hint}
      value={form[field]}
      error={errors[field]}
      isReadOnly={isReadOnly}
      onChange={(value) => onChange({ ...form, [field]: value })}
    />
  );
  const setLettering = (key: keyof RulesForm['lettering'], value: string) =>
    onChange({ ...form, lettering: { ...form.lettering, [key]: value } });
  const setBreak = (index: number, key: 'minQty' | 'discountBp', value: string) =>
    onChange({
      ...form,
      quantityBreaks: form.quantityBreaks.map((bracket, i) => (i === index ? { ...bracket, [key]: value } : bracket)),
    });
  const setBlank = (garment: string, size: string, value: string) =>
    onChange({
      ...form,
      garmentBaseCents: { ...form.garmentBaseCents, [garment]: { ...form.garmentBaseCents[garment], [size]: value } },
    });

  return (
    <div className="grid gap-4">
      <Group title="Stitching" note="Charged per garment; a placement never costs less than its minimum.">
        {money('centsPerThousandStitches', 'Rate per 1,000 stitches', 'per 1,000')}
        {money('minimumPerPlacementCents', 'Least a placement costs')}
      </Group>
      <Group title="Lettering" note="Names and monograms have their own rate and minimum.">
        <NumberField
          label="Lettering rate per 1,000 stitches"
          prefix="$"
          suffix="per 1,000"
          value={form.lettering.centsPerThousandStitches}
          error={errors['lettering.centsPerThousandStitches']}
          isReadOnly={isReadOnly}
          onChange={(v) => setLettering('centsPerThousandStitches', v)}
        />
        <NumberField
          label="Least a name costs"
          prefix="$"
          value={form.lettering.minimumCents}
          error={errors['lettering.minimumCents']}
          isReadOnly={isReadOnly}
          onChange={(v) => setLettering('minimumCents', v)}
        />
      </Group>
      <Group title="Hoopings and threads">
        {money(
          'extraHoopingCents',
          'Each re-hooping after the first',
          'per garment',
          'Borders are stitched one hooping at a time.',
        )}
        {money('colorChangeCents', 'Each colour change', 'per garment')}
      </Group>
      <Group title="One-off fees and rush">
        {money(
          'artworkSetupCents',
          'Customer artwork setup',
          'per order',
          'Checking and digitizing a customer’s own design, once per order.',
        )}
        <NumberField
          label="Rush surcharge on embroidery"
          suffix="%"
          value={form.rushMultiplierBp}
          error={errors.rushMultiplierBp}
          isReadOnly={isReadOnly}
          onChange={(v) => onChange({ ...form, rushMultiplierBp: v })}
        />
      </Group>
      <fieldset className="min-w-0 rounded-xl border border-linen-200 p-4">
        <legend className="px-1 font-semibold">Quantity breaks</legend>
        <p className="mb-3 text-sm text-walnut-500">
          Off the embroidery work (not the blanks) when an order has at least this many garments.
        </p>
        {errors.quantityBreaks && <p className="mb-2 text-sm text-madder-700">{errors.quantityBreaks}</p>}
        <ul className="grid gap-3">
          {form.quantityBreaks.map((bracket, index) => (
            <li key={index} className="flex flex-wrap items-end gap-3">
              <NumberField
                className="w-36"
                label={`Break ${index + 1}: from`}
                step="1"
                suffix="garments"
                value={bracket.minQty}
                error={errors[`quantityBreaks.${index}.minQty`]}
                isReadOnly={isReadOnly}
                onChange={(v) => setBreak(index, 'minQty', v)}
              />
              <NumberField
                className="w-32"
                label="Discount"
                suffix="%"
                value={bracket.discountBp}
                error={errors[`quantityBreaks.${index}.discountBp`]}
                isReadOnly={isReadOnly}
                onChange={(v) => setBreak(index, 'discountBp', v)}
              />
              {!isReadOnly && (
                <button
                  type="button"
                  className="min-h-10 rounded-full px-3 text-sm text-madder-700 underline-offset-2 hover:underline"
                  onClick={() =>
                    onChange({ ...form, quantityBreaks: form.quantityBreaks.filter((_, i) => i !== index) })
                  }
                >
                  Remove break {index + 1}
                </button>
              )}
            </li>
          ))}
        </ul>
        {!isReadOnly && (
          <button
            type="button"
            className="mt-3 min-h-10 rounded-full border border-linen-300 px-4 text-sm hover:bg-linen-100"
            onClick={() =>
              onChange({ ...form, quantityBreaks: [...form.quantityBreaks, { minQty: '', discountBp: '' }] })
            }
          >
            Add a quantity break
          </button>
        )}
      </fieldset>
      <Group title="Tax">
        <NumberField
          label="Sales tax on the subtotal"
          suffix="%"
          value={form.taxRateBp}
          error={errors.taxRateBp}
          isReadOnly={isReadOnly}
          onChange={(v) => onChange({ ...form, taxRateBp: v })}
        />
      </Group>
      <fieldset className="min-w-0 rounded-xl border border-linen-200 p-4">
        <legend className="px-1 font-semibold">Garment blanks</legend>
        <p className="mb-3 text-sm text-walnut-500">The plain garment’s price, per garment and size.</p>
        <div className="grid gap-4">
          {Object.entries(form.garmentBaseCents).map(([garment, sizes]) => (
            <div key={garment}>
              <h4 className="mb-1.5 text-sm font-semibold">{garmentLabel(garment)}</h4>
              <div className="grid grid-cols-3 gap-2 sm:grid-cols-4 lg:grid-cols-6">
                {Object.entries(sizes).map(([size, value]) => (
                  <NumberField
                    key={size}
                    label={
                      <>
                        <span className="sr-only">{garmentLabel(garment)}, </span>
                        {sizeLabel(garment, size)}
                      </>
                    }
                    prefix="$"
                    value={value}
                    error={errors[`garmentBaseCents.${garment}.${size}`]}
                    isReadOnly={isReadOnly}
                    onChange={(v) => setBlank(garment, size, v)}
                  />
                ))}
              </div>
            </div>
          ))}
        </div>
      </fieldset>
    </div>
  );
}
