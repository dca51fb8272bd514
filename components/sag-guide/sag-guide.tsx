// How to measure sag, with pictures drawn in SVG: the same reference points read three times, in
// the one set of words and reading labels the sheet and the e-mails use (lib/validations/sag-terms.ts).
import { FREE_SAG_NOTE, READINGS, SAG_TERMS } from "@/lib/validations/sag-terms";

const ink = "#1c1917";
const pine = "#185a4b";
const amber = "#b45309";

function Figure({ title, caption, children }: { title: string; caption: string; children: React.ReactNode }) {
  return (
    <figure className="flex flex-col gap-2 rounded-xl border border-stone-200 bg-white p-3">
      <svg viewBox="0 0 240 150" role="img" aria-label={title} className="h-auto w-full max-w-sm">
        {children}
      </svg>
      <figcaption className="text-sm text-stone-800">
        <strong>{title}.</strong> {caption}
      </figcaption>
    </figure>
  );
}

/** A rear wheel, swingarm and fender, with the measured length drawn as a tape. */
function RearEnd({ drop, rider, stand }: { drop: number; rider?: boolean; stand?: boolean }) {
  const axleY = 110;
  const fenderY = 30 + drop;
  return (
    <>
      <line x1="10" y1="140" x2="230" y2="140" stroke={ink} strokeWidth="2" />
      {stand ? <rect x="120" y="95" width="40" height="45" fill="#d6d3d1" stroke={ink} /> : null}
      <circle cx="70" cy={stand ? axleY - 12 : axleY} r="28" fill="none" stroke={ink} strokeWidth="6" />
      <circle cx="70" cy={stand ? axleY - 12 : axleY} r="4" fill={ink} />
      <line
        x1="70"
        y1={stand ? axleY - 12 : axleY}
        x2="170"
        y2={70 + drop / 2}
        stroke={ink}
        strokeWidth="6"
        strokeLinecap="round"
      />
      <path
        d={`M40 ${fenderY} L140 ${fenderY - 6} L200 ${fenderY - 10}`}
        fill="none"
        stroke={ink}
        strokeWidth="4"
        strokeLinecap="round"
      />
      {rider ? (
        <g stroke={pine} strokeWidth="5" strokeLinecap="round" fill="none">
          <circle cx="160" cy={fenderY - 48} r="9" fill={pine} />
          <line x1="160" y1={fenderY - 38} x2="150" y2={fenderY - 12} />
          <line x1="150" y1={fenderY - 12} x2="170" y2={fenderY + 12} />
        </g>
      ) : null}
      <line
        x1="70"
        y1={stand ? axleY - 16 : axleY - 4}
        x2="70"
        y2={fenderY + 2}
        stroke={amber}
        strokeWidth="3"
        strokeDasharray="6 3"
      />
      <text x="78" y={(fenderY + axleY) / 2 + 4} fontSize="13" fill={amber} fontWeight="700">
        {stand ? READINGS.A.label : rider ? READINGS.C.label : READINGS.B.label}
      </text>
    </>
  );
}

export function SagGuide() {
  return (
    <section aria-labelledby="sag-guide-heading" className="flex flex-col gap-3">
      <h3 id="sag-guide-heading" className="text-lg font-semibold">
        How to measure sag
      </h3>
      <p className="text-stone-700">
        Pick two fixed points and always measure between the same two: at the rear, the axle centre and a mark on the
        fender or side panel straight above it; at the front, the wiper seal and the axle clamp. A helper makes it
        easier.
      </p>
      <div className="grid grid-cols-1 gap-3 md:grid-cols-3">
        <Figure title={`Reading A, ${READINGS.A.name}`} caption={READINGS.A.how}>
          <RearEnd drop={0} stand />
        </Figure>
        <Figure
          title={`Reading B, ${READINGS.B.name}: ${SAG_TERMS.static.name.toLowerCase()} = ${SAG_TERMS.static.formula}`}
          caption={READINGS.B.how}
        >
          <RearEnd drop={10} />
        </Figure>
        <Figure
          title={`Reading C, ${READINGS.C.name}: ${SAG_TERMS.race.name.toLowerCase()} = ${SAG_TERMS.race.formula}`}
          caption={READINGS.C.how}
        >
          <RearEnd drop={30} rider />
        </Figure>
      </div>
      <p className="text-sm text-stone-700">{FREE_SAG_NOTE}</p>
    </section>
  );
}
