import Link from "next/link";

/** A commission's number (linking to its page) and title, as every overview and cohort table shows it. */
export function CommissionCell({ slug, commission }: { slug: string; commission: { id: number; number: string; title: string } }) {
  return (
    <>
      <Link href={`/${slug}/commissions/${commission.id}`} className="font-mono font-semibold text-rosewood-700 underline-offset-2 hover:underline">
        {commission.number}
      </Link>
      <span className="ml-2">{commission.title}</span>
    </>
  );
}
