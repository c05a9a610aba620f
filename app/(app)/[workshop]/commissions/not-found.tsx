"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";

// A commission that does not exist, or that the caller may not see: the same answer for both.
export default function CommissionNotFound() {
  const slug = usePathname().split("/")[1] ?? "";
  return (
    <div className="mx-auto max-w-xl py-12 text-center">
      <h2 className="text-2xl font-semibold">No such commission</h2>
      <p className="mt-3 text-graphite-700">It does not exist, or it is not one you can see. Check the link, or find it in the list.</p>
      <Link href={`/${slug}/commissions`} className="mt-6 inline-block font-semibold text-rosewood-700 underline">
        All commissions
      </Link>
    </div>
  );
}
