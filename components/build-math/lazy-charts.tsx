"use client";

// The build-math charts, loaded after the page: recharts weighs about 120 kB gzipped, two thirds
// of a page's first-load budget (README, "First-load JavaScript"). The tables beside each chart
// carry the same figures from the first paint.
import dynamic from "next/dynamic";
import { ChartLoading } from "./chart-loading";

export const TensionChart = dynamic(() => import("./tension-chart").then((m) => m.TensionChart), { ssr: false, loading: () => <ChartLoading height={260} /> });

export const HarmonicsChart = dynamic(() => import("./harmonics-chart").then((m) => m.HarmonicsChart), { ssr: false, loading: () => <ChartLoading height={280} /> });
