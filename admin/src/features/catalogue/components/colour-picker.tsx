/** True for a complete `#rrggbb`, the only form the swatch and the browser's colour picker can show. */
export const isHexColour = (text: string) => /^#[0-9a-f]{6}$/i.test(text);

/**
 * The browser's colour picker beside a typed hex field, writing `#RRGGBB` back; with its swatch, shown as large
 * as the form wants (a thread spool, a fabric strip).
 */
export function ColourPicker({
  hex,
  onPick,
  swatchClassName,
}: {
  hex: string;
  onPick: (hex: string) => void;
  swatchClassName: string;
}) {
  const isValid = isHexColour(hex);
  return (
    <div className="flex items-end gap-3">
      <input
        type="color"
        aria-label="Pick the colour"
        value={isValid ? hex.toLowerCase() : '#000000'}
        onChange={(event) => onPick(event.target.value.toUpperCase())}
        className="h-10 w-14 shrink-0 cursor-pointer rounded-lg border border-linen-300 bg-white"
      />
      <span
        className={`border border-walnut-900/15 ${swatchClassName}`}
        style={{ backgroundColor: isValid ? hex : 'transparent' }}
        aria-hidden="true"
      />
    </div>
  );
}
