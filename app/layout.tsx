import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { ToastProvider } from "@/components/ui/toast";
import { displayFont, monoFont, sansFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Scalewright", template: "%s · Scalewright" },
  description: "Commissions, build math and bookkeeping for guitar-building schools and custom shops.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#712e28" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${displayFont.variable} ${sansFont.variable} ${monoFont.variable}`}>
      <body className="min-h-dvh">
        <ToastProvider>{children}</ToastProvider>
      </body>
    </html>
  );
}
