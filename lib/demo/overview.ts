// The invented course cohort at Fernhollow (the school), so the owner's overview shows a cohort's
// progress over the demo commissions (db/seeds/02_demo_commissions.ts) of its two builders.

export const DEMO_COHORT = {
  workshop: "fernhollow",
  name: "Spring production course",
  startsDaysAgo: 75,
  lengthDays: 150,
  builders: ["tobias.reyne@example.com", "ilse.varga@example.com"],
};
