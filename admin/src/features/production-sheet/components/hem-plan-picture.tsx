import type { SheetPlacement } from '@server/contracts/production-sheet.ts';

type Border = NonNullable<SheetPlacement['border']>;

const FILLS = ['#e9c3b8', '#c9d8c4', '#f3e0a6', '#d3dbe8'];
/** Drawing units: the hem is always 1000 wide, so labels keep their size whatever the hem's length. */
const WIDTH = 1000;
const STRIP = 110;
const TOP = 30;

/**
 * The hem laid flat, to scale along its length: the centre mark in the middle, each hooping a numbered rectangle
 * over the repeats it holds. On a loop both ends are the back, where the row meets itself.
 */
export function HemPlanPicture({ border }: { border: Border }) {
  const scale = WIDTH / border.runLengthMm;
  const groupMm = (repeats: number) => (repeats - 1) * border.pitchMm + border.repeatWidthMm;
  const label =
    `Hooping plan along the ${Math.round(border.runLengthMm)} mm hem: ` +
    border.hoopings.map((h) => `hooping ${h.order} holds repeat ${h.repeatNumbers.join(' and ')}`).join('; ') +
    '.';
  return (
    <svg
      role="img"
      aria-label={label}
      viewBox={`0 0 ${WIDTH} ${TOP + STRIP + 34}`}
      className="h-auto w-full max-w-3xl"
      data-testid="hooping-plan-picture"
    >
      <rect x={0} y={TOP} width={WIDTH} height={STRIP} fill="#f8f1e4" />
      <line x1={0} x2={WIDTH} y1={TOP + STRIP} y2={TOP + STRIP} stroke="#2e241e" strokeWidth={3} />
      {border.hoopings.map((hooping) => {
        const widthMm = groupMm(hooping.repeatNumbers.length);
        const cx = hooping.fromRowStartMm * scale;
        return (
          <g key={hooping.order}>
            <rect
              x={(hooping.fromRowStartMm - widthMm / 2) * scale + 3}
              y={TOP + 16}
              width={widthMm * scale - 6}
              height={STRIP - 32}
              rx={6}
              fill={FILLS[(hooping.order - 1) % FILLS.length]}
              stroke="#2e241e"
              strokeWidth={1.5}
            />
            <circle cx={cx} cy={TOP + STRIP / 2} r={22} fill="#fff" stroke="#2e241e" strokeWidth={1.5} />
            <text x={cx} y={TOP + STRIP / 2 + 9} textAnchor="middle" fontSize={26} fontWeight={600} fill="#2e241e">
              {hooping.order}
            </text>
            <text x={cx} y={TOP + STRIP + 26} textAnchor="middle" fontSize={20} fill="#4d3d32">
              {hooping.fromCentreMm > 0 ? '+' : ''}
              {Number(hooping.fromCentreMm.toFixed(1))}
            </text>
          </g>
        );
      })}
      <line
        x1={WIDTH / 2}
        x2={WIDTH / 2}
        y1={TOP - 6}
        y2={TOP + STRIP}
        stroke="#b4513a"
        strokeWidth={3}
        strokeDasharray="8 6"
      />
      <text x={WIDTH / 2} y={20} textAnchor="middle" fontSize={20} fill="#9c4230">
        centre mark
      </text>
      {border.isClosed && (
        <>
          <text x={2} y={20} fontSize={20} fill="#4d3d32">
            back
          </text>
          <text x={WIDTH - 2} y={20} textAnchor="end" fontSize={20} fill="#4d3d32">
            back
          </text>
        </>
      )}
    </svg>
  );
}
