import type { ReactNode } from "react";
import MarketingLayout from "../(marketing)/layout";

// Public working tools (no sign-in) share the signed-out header and footer; the group exists for
// its own loading and error screens and the wider page the tables of numbers need.
export default function ToolsLayout({ children }: { children: ReactNode }) {
  return <MarketingLayout>{children}</MarketingLayout>;
}
