import localFont from "next/font/local";

// Shipped with the app (copied from @fontsource packages, SIL OFL; licences in ./licenses):
// next build never fetches a font.
export const displayFont = localFont({
  src: "./fonts/fraunces-latin-wght-normal.woff2",
  variable: "--font-display",
  weight: "300 800",
  display: "swap",
});

export const sansFont = localFont({
  src: [
    { path: "./fonts/public-sans-latin-wght-normal.woff2", style: "normal", weight: "100 900" },
    { path: "./fonts/public-sans-latin-wght-italic.woff2", style: "italic", weight: "100 900" },
  ],
  variable: "--font-sans",
  display: "swap",
});

export const monoFont = localFont({
  src: [
    { path: "./fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400" },
    { path: "./fonts/ibm-plex-mono-latin-600-normal.woff2", weight: "600" },
  ],
  variable: "--font-mono",
  display: "swap",
});
