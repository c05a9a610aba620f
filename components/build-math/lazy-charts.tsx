"use client";

// The build-math charts and the fret table, loaded after the page: recharts weighs about 120 kB
// gzipped, two thirds of a page's first-load budget (README, "First-load JavaScript"), and the fret
// table with TanStack Table about 10 kB, which the calculator has no room for. The tables beside
// each chart carry the same figures from the first paint; the fret table's place keeps its height.
import dynamic from "next/dynamic";
import { ChartLoading } from "./chart-loading";

export const TensionChart = dynamic(() => import("./tension-chart").then((m) => m.TensionChart), { ssr: false, loading: () => <ChartLoading height={260} /> });

export const HarmonicsChart = dynamic(() => import("./harmonics-chart").then((m) => m.HarmonicsChart), { ssr: false, loading: () => <ChartLoading height={280} /> });

/** A 24-fret table's rows (header, nut, frets) at the table's row height, plus its toolbar. */
const FRET_TABLE_HEIGHT = 48 + 26 * 33;

export const FretTable = dynamic(() => import("./fret-table").then((m) => m.FretTable), { ssr: false, loading: () => <ChartLoading height={FRET_TABLE_HEIGHT} label="Loading the fret table…" /> });
