// The assumptions behind the figures, in plain words (help text required by SOURCES §2.5, §2.10, §2.11).
import { MODEL_NOTES } from "@/lib/lutherie/compute-spec";

export function ModelNotes() {
  return (
    <div className="space-y-3 text-sm text-graphite-700">
      <p>
        <strong>Frets.</strong> Twelve-tone equal temperament, d<sub>n</sub> = L·(1 − 2<sup>−n/12</sup>), from the nut to each fret. On
        a fanned neck each edge is its own scale and the chosen fret is square to the centre line. The old rule of 18 is shown for
        comparison only: it puts every fret short, about 1 cent flatter per fret.
      </p>
      <p>
        <strong>Unit weight.</strong> {MODEL_NOTES.unitWeight} Real strings differ (flattened wraps, gaps, several wrap layers): weigh a
        known length and enter the measured unit weight when it matters.
      </p>
      <p>
        <strong>Tension and stress.</strong> {MODEL_NOTES.tension} {MODEL_NOTES.stress} The limits — a warning from 70 % and an error
        from 80 % — are a common-practice margin, not a standard. Real strings usually fail lower, at the ball end, the tuner post or a
        sharp saddle.
      </p>
      <p>
        <strong>Pickups.</strong> {MODEL_NOTES.harmonics}
      </p>
      <p>
        <strong>Inharmonicity.</strong> {MODEL_NOTES.inharmonicity}
      </p>
      <p>
        <strong>Saddle move.</strong> {MODEL_NOTES.saddleMove} It is about twice the move of the simpler model that only lengthens the
        fretted half.
      </p>
      <p>
        <strong>Common practice.</strong> Tension ranges, the tension-jump warning, the near-null threshold, the fret-crown width and the
        default core size are common practice with no published source; change them under “Constants and thresholds”.
      </p>
    </div>
  );
}
