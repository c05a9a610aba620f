"use client";

// The calculator's setup helpers (pull-test tension, saddle move), loaded after the page: they sit
// below the figures and keep the calculator's first load within its budget (README, "First-load
// JavaScript"). The placeholder holds their height so nothing below jumps.
import dynamic from "next/dynamic";
import { ChartLoading } from "./chart-loading";

export const SetupHelpers = dynamic(() => import("./setup-helpers").then((m) => m.SetupHelpers), { ssr: false, loading: () => <ChartLoading height={220} label="Loading the setup helpers…" /> });
