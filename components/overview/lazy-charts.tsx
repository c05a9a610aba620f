"use client";

// The overview's charts, loaded after the page: recharts weighs about 120 kB gzipped, two thirds
// of a page's first-load budget (README, "First-load JavaScript"). The tables beside each chart
// carry the same figures from the first paint.
import dynamic from "next/dynamic";
import { ChartLoading } from "@/components/build-math/chart-loading";

export const WorkloadChart = dynamic(() => import("./workload-chart").then((m) => m.WorkloadChart), { ssr: false, loading: () => <ChartLoading height={180} /> });

export const StageTimeChart = dynamic(() => import("./stage-time-chart").then((m) => m.StageTimeChart), { ssr: false, loading: () => <ChartLoading height={260} /> });
