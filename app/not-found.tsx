import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { SiteHeader } from "@/components/site-header";

export default function NotFound() {
  return (
    <>
      <SiteHeader />
      <main className="mx-auto max-w-xl px-4 py-16 text-center">
        <p className="font-mono text-sm text-brass-700">404</p>
        <h1 className="mt-2 text-2xl font-semibold">Nothing here</h1>
        <p className="mt-3 text-graphite-700">The page does not exist, or you do not have access to it.</p>
        <Link href="/" className={buttonClasses("secondary", "md", "mt-6")}>
          Back to the start
        </Link>
      </main>
    </>
  );
}
