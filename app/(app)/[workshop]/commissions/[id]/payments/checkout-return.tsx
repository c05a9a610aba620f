"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Alert } from "@/components/ui/alert";

const REFRESH_EVERY_MS = 2000;
const GIVE_UP_AFTER_MS = 60_000;

/**
 * What the payer sees on coming back from the hosted payment page. While the processor has not
 * confirmed the payment yet, the page reloads its data every 2 s for a minute.
 */
export function CheckoutReturn({ outcome, confirming }: { outcome: "success" | "cancelled"; confirming: boolean }) {
  const router = useRouter();
  const [gaveUp, setGaveUp] = useState(false);

  useEffect(() => {
    if (outcome !== "success" || !confirming) return;
    const started = Date.now();
    const timer = setInterval(() => {
      if (Date.now() - started > GIVE_UP_AFTER_MS) {
        setGaveUp(true);
        clearInterval(timer);
      } else router.refresh();
    }, REFRESH_EVERY_MS);
    return () => clearInterval(timer);
  }, [outcome, confirming, router]);

  if (outcome === "cancelled") {
    return <Alert tone="info">Payment cancelled: nothing was charged. You can pay whenever you are ready.</Alert>;
  }
  if (!confirming) {
    return <Alert tone="success">Payment received, thank you. Your receipt is on its way by e-mail.</Alert>;
  }
  return (
    <Alert tone="warning">
      {gaveUp
        ? "The payment service has not confirmed your payment yet. Nothing is lost: it will show here as soon as it is confirmed. Reload the page later."
        : "Thank you. The payment service is confirming your payment; this page updates by itself."}
    </Alert>
  );
}
