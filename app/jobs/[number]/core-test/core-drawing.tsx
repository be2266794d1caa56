/**
 * Our own drawing of the stator core for hot spots: an end view (the ring of slots round the bore, as on the
 * sheet's slot diagram, slot 1 at the top and numbers running clockwise) and the bore opened out flat
 * (slots across, drive end at the top, opposite end at the bottom), each hot spot marked with its number in
 * both. Markers are numbered shapes, not colour alone; a hot spot over the shop's limit is a filled
 * triangle, one within it an open circle. The text table beside it says the same. No hooks: prints too.
 */
export interface DrawnHotSpot {
  n: number;
  slot: number;
  axialPositionMm: number;
  riseK: number;
  overLimit: boolean;
  stage: string;
}

const R_OUT = 110;
const R_BORE = 62;
const R_SLOT_OUT = 84;
const polar = (r: number, deg: number): [number, number] => {
  const a = ((deg - 90) * Math.PI) / 180;
  return [r * Math.cos(a), r * Math.sin(a)];
};
const f = (n: number) => n.toFixed(2);

function Marker({ x, y, spot }: { x: number; y: number; spot: DrawnHotSpot }) {
  return (
    <g className={spot.overLimit ? 'hot over' : 'hot'}>
      {spot.overLimit ? (
        <path
          d={`M${f(x)},${f(y - 7)} L${f(x + 7)},${f(y + 5)} L${f(x - 7)},${f(y + 5)} Z`}
          fill="#a1261b"
          stroke="#1d2430"
          strokeWidth="1"
        />
      ) : (
        <circle cx={x} cy={y} r={6} fill="#fff" stroke="#1d2430" strokeWidth="1.5" />
      )}
      <text x={x} y={y - 9} textAnchor="middle" fontSize="9" fontWeight="bold">
        {spot.n}
      </text>
    </g>
  );
}

export function CoreDrawing({ slots, coreLengthMm, spots }: { slots: number; coreLengthMm: number; spots: readonly DrawnHotSpot[] }) {
  const step = 360 / slots;
  const labelEvery = slots > 48 ? 6 : slots > 24 ? 3 : 1;
  const W = 260;
  const H = 140;
  const x0 = 20;
  const colW = (W - 2 * x0) / slots;
  const yOf = (mm: number) => 20 + (Math.min(mm, coreLengthMm) / coreLengthMm) * (H - 40);
  const desc =
    spots.length === 0
      ? 'No hot spots recorded.'
      : spots
          .map(
            (s) =>
              `Hot spot ${s.n}: slot ${s.slot}, ${s.axialPositionMm} mm from the drive-end face, ${s.riseK} K rise${s.overLimit ? ', over the limit' : ''}.`,
          )
          .join(' ');
  return (
    <div className="core-drawing">
      <svg
        viewBox={`${-R_OUT - 12} ${-R_OUT - 12} ${2 * R_OUT + 24} ${2 * R_OUT + 24}`}
        width="300"
        height="300"
        role="img"
        aria-labelledby="core-end-t core-end-d"
      >
        <title id="core-end-t">Core end view: slots round the bore, slot 1 at the top, numbered clockwise, with the hot spots</title>
        <desc id="core-end-d">{desc}</desc>
        <circle r={R_OUT} fill="#eef0f3" stroke="#1d2430" strokeWidth="1.5" />
        <circle r={R_BORE} fill="#fff" stroke="#1d2430" strokeWidth="1.5" />
        {Array.from({ length: slots }, (_, i) => {
          const a = i * step;
          const [x1, y1] = polar(R_BORE, a);
          const [x2, y2] = polar(R_SLOT_OUT, a);
          const [tx, ty] = polar(R_OUT + 6, a);
          return (
            <g key={i}>
              <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="#5a6473" strokeWidth={Math.max(1.2, ((Math.PI * 2 * R_BORE) / slots) * 0.45)} />
              {i % labelEvery === 0 && (
                <text x={tx} y={ty + 3} textAnchor="middle" fontSize="7">
                  {i + 1}
                </text>
              )}
            </g>
          );
        })}
        {spots.map((s) => {
          const [x, y] = polar((R_SLOT_OUT + R_OUT) / 2, (s.slot - 1) * step);
          return <Marker key={s.n} x={x} y={y} spot={s} />;
        })}
      </svg>
      <svg viewBox={`0 0 ${W} ${H}`} width="360" height={(360 * H) / W} role="img" aria-labelledby="core-bore-t core-bore-d">
        <title id="core-bore-t">
          Bore opened out flat: slots across, drive end at the top, opposite end at the bottom, with the hot spots
        </title>
        <desc id="core-bore-d">{desc}</desc>
        <rect x={x0} y={20} width={W - 2 * x0} height={H - 40} fill="#eef0f3" stroke="#1d2430" />
        {Array.from({ length: slots }, (_, i) => (
          <g key={i}>
            <line
              x1={x0 + (i + 0.5) * colW}
              y1={20}
              x2={x0 + (i + 0.5) * colW}
              y2={H - 20}
              stroke="#9aa4b2"
              strokeWidth={Math.max(0.5, colW * 0.4)}
            />
            {i % labelEvery === 0 && (
              <text x={x0 + (i + 0.5) * colW} y={H - 8} textAnchor="middle" fontSize="6">
                {i + 1}
              </text>
            )}
          </g>
        ))}
        <text x={x0} y={12} fontSize="7">
          Drive end (0 mm)
        </text>
        <text x={W - x0} y={12} fontSize="7" textAnchor="end">
          {coreLengthMm} mm: opposite end at the bottom
        </text>
        {spots.map((s) => (
          <Marker key={s.n} x={x0 + (s.slot - 0.5) * colW} y={yOf(s.axialPositionMm)} spot={s} />
        ))}
      </svg>
    </div>
  );
}
