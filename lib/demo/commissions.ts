// Invented demo commissions and a course cohort for Fernhollow (the school), so the owner's
// overview has a workload, stage times, an overdue build, a deposit outstanding and a cohort's
// progress to show. Every title and person is made up. Days are counted back from the seed run.

export interface DemoCommission {
  title: string;
  client: string; // e-mail of a demo client
  builder: string | null; // e-mail of a demo builder
  preset: string; // lib/lutherie/presets id for its approved spec
  priceMinor: number;
  /** The stages it went through, with the days ago it entered each (oldest first; the last is where it is). */
  path: Array<[stage: string, daysAgo: number]>;
  /** Target date, days from the seed run (negative: already past). */
  targetInDays: number | null;
  depositPaid: boolean;
  balancePaid?: boolean;
  inCohort: boolean;
}

export const DEMO_COHORT = {
  workshop: "fernhollow",
  name: "Spring production course",
  startsDaysAgo: 75,
  lengthDays: 150,
  builders: ["tobias.reyne@example.com", "ilse.varga@example.com"],
};

export const DEMO_COMMISSIONS: DemoCommission[] = [
  {
    title: "Single-cut with a carved maple top",
    client: "otto.lindqvist@example.com",
    builder: "tobias.reyne@example.com",
    preset: "six",
    priceMinor: 420_000,
    path: [["spec", 120], ["deposit", 110], ["timber", 104], ["body_neck_shaping", 95], ["fretboard_frets", 85], ["finish", 70], ["finish_cure_level", 50], ["assembly_electronics", 40], ["final_setup", 33], ["delivered", 30]],
    targetInDays: -28,
    depositPaid: true,
    balancePaid: true,
    inCohort: true,
  },
  {
    title: "Seven-string in roasted maple",
    client: "nadia.fensome@example.com",
    builder: "tobias.reyne@example.com",
    preset: "seven",
    priceMinor: 360_000,
    path: [["spec", 60], ["deposit", 52], ["timber", 48], ["body_neck_shaping", 40], ["fretboard_frets", 9]],
    targetInDays: 20,
    depositPaid: true,
    inCohort: true,
  },
  {
    title: "Short-scale bass, ash body",
    client: "otto.lindqvist@example.com",
    builder: "ilse.varga@example.com",
    preset: "bass-four",
    priceMinor: 310_000,
    path: [["spec", 70], ["deposit", 66], ["timber", 60], ["body_neck_shaping", 52], ["fretboard_frets", 41], ["finish", 25]],
    targetInDays: -5,
    depositPaid: true,
    inCohort: true,
  },
  {
    title: "Baritone for open tunings",
    client: "priya.ramnath@example.com",
    builder: "tobias.reyne@example.com",
    preset: "baritone",
    priceMinor: 340_000,
    path: [["spec", 14], ["deposit", 6]],
    targetInDays: 90,
    depositPaid: false,
    inCohort: true,
  },
  {
    title: "Offset with two single-coils",
    client: "nadia.fensome@example.com",
    builder: "ilse.varga@example.com",
    preset: "six",
    priceMinor: 290_000,
    path: [["spec", 20], ["deposit", 12], ["timber", 3]],
    targetInDays: 60,
    depositPaid: true,
    inCohort: false,
  },
  {
    title: "Headless travel guitar (request)",
    client: "wren.tallis@example.com",
    builder: null,
    preset: "six",
    priceMinor: 0,
    path: [["spec", 2]],
    targetInDays: null,
    depositPaid: false,
    inCohort: false,
  },
];
