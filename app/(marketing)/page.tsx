import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card, CardBody } from "@/components/ui/card";

const STEPS = [
  { name: "Spec", text: "Scale, frets, strings and pickups, with slot positions, tensions and harmonics computed as you type." },
  { name: "Deposit", text: "The client approves a locked spec version and pays the deposit online." },
  { name: "Build", text: "Your stages, your order: timber to assembly, with photos the client follows from a phone." },
  { name: "Setup", text: "Action, relief, nut slots and intonation recorded against the approved spec, then signed." },
  { name: "Delivery", text: "Balance taken, build sheet printed, and every payment reconciled with the processor." },
];

export default function LandingPage() {
  return (
    <>
      <section className="mx-auto grid max-w-6xl gap-10 px-4 py-14 sm:px-6 md:grid-cols-[1.2fr_1fr] md:py-20">
        <div>
          <p className="mb-3 text-xs font-semibold uppercase tracking-[0.2em] text-rosewood-700">For schools and custom shops</p>
          <h1 className="text-4xl leading-tight font-semibold sm:text-5xl">
            Every commission, from the first spec to the last saddle adjustment.
          </h1>
          <p className="mt-5 max-w-xl text-lg text-graphite-700">
            Scalewright runs the paid builds of guitar-building schools and custom shops: the agreed spec with its fret
            and tension math, the deposit, the stages and photos, the final setup and the balance — one place for the
            client, the builder, the bookkeeper and the owner.
          </p>
          <div className="mt-8 flex flex-wrap gap-3">
            <Link href="/sign-in" className={buttonClasses("primary", "lg")}>
              Sign in to your workshop
            </Link>
            <Link href="/calculator" className={buttonClasses("secondary", "lg")}>
              Open the build calculator
            </Link>
          </div>
        </div>
        <Card className="self-start">
          <CardBody className="space-y-3">
            <p className="text-xs font-semibold uppercase tracking-wider text-graphite-500">Fret 12 sits at half the scale</p>
            <FretDiagram />
            <p className="text-xs text-graphite-500">
              Slot positions follow the twelve-tone equal-temperament rule, d<sub>n</sub> = L·(1 − 2<sup>−n/12</sup>),
              for single and fanned scales.
            </p>
          </CardBody>
        </Card>
      </section>

      <section aria-labelledby="flow" className="border-t border-spruce-200 bg-white/60">
        <div className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
          <h2 id="flow" className="text-2xl font-semibold">
            How a commission moves
          </h2>
          <ol className="mt-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-5">
            {STEPS.map((s, i) => (
              <li key={s.name} className="rounded-panel border border-spruce-200 bg-white p-4">
                <p className="font-mono text-xs text-brass-700">{String(i + 1).padStart(2, "0")}</p>
                <p className="mt-1 font-display text-lg font-semibold">{s.name}</p>
                <p className="mt-1 text-sm text-graphite-700">{s.text}</p>
              </li>
            ))}
          </ol>
        </div>
      </section>
    </>
  );
}

/** A 24-fret board drawn from the fret rule itself: the picture is the formula. */
function FretDiagram() {
  const width = 320;
  const frets = Array.from({ length: 25 }, (_, n) => width * (1 - 2 ** (-n / 12)) * (4 / 3));
  return (
    <svg viewBox={`0 0 ${width + 8} 60`} className="w-full" role="img" aria-label="Fret positions of a 24-fret neck">
      <path d={`M4 14 L${width + 4} 8 L${width + 4} 52 L4 46 Z`} className="fill-spruce-200" />
      {frets.map((x, n) => (
        <line
          key={n}
          x1={x + 4}
          x2={x + 4}
          y1={14 - (x / width) * 6}
          y2={46 + (x / width) * 6}
          className={n === 12 ? "stroke-rosewood-700" : n === 0 ? "stroke-graphite-900" : "stroke-brass-600"}
          strokeWidth={n === 0 ? 3 : n === 12 ? 2 : 1}
        />
      ))}
    </svg>
  );
}
