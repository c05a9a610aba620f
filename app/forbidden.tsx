import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { SiteHeader } from "@/components/site-header";

// Shown with status 403 when a member's role lacks the permission a page needs (forbidden()).
export default function Forbidden() {
  return (
    <>
      <SiteHeader />
      <main className="mx-auto max-w-xl px-4 py-16 text-center">
        <p className="font-mono text-sm text-brass-700">403</p>
        <h1 className="mt-2 text-2xl font-semibold">Not for your role</h1>
        <p className="mt-3 text-graphite-700">Your role in this workshop does not include this page. Ask the workshop&apos;s owner if you need it.</p>
        <Link href="/workshops" className={buttonClasses("secondary", "md", "mt-6")}>
          Your workshops
        </Link>
      </main>
    </>
  );
}
