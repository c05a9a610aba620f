"use client";

// The logo card's form, loaded after the page: the upload client it needs (the photo pipeline's)
// weighs about 20 kB gzipped and would take the settings page past its first-load budget (README,
// "First-load JavaScript"). The placeholder holds the card's place until it arrives.
import dynamic from "next/dynamic";
import { Loading } from "@/components/commissions/query-states";

export const LogoForm = dynamic(() => import("./logo-form").then((m) => m.LogoForm), { ssr: false, loading: () => <Loading label="Loading the logo…" rows={2} /> });
