// The invented demo scenario: two workshops and their people. Every name here is made up;
// every address is at example.com.
import type { Role } from "../auth/permissions";

export type DemoRole = Role;

export interface DemoWorkshop {
  slug: string;
  name: string;
  unitPreference: "mm" | "in";
  currency: string;
}

export interface DemoPerson {
  email: string;
  name: string;
  roles: Record<string, DemoRole>;
}

export const DEMO_WORKSHOPS: DemoWorkshop[] = [
  { slug: "fernhollow", name: "Fernhollow Luthiery School", unitPreference: "mm", currency: "EUR" },
  { slug: "quillmere", name: "Quillmere Custom Guitars", unitPreference: "in", currency: "USD" },
];

export const DEMO_PEOPLE: DemoPerson[] = [
  { email: "maren.ostby@example.com", name: "Maren Østby", roles: { fernhollow: "owner" } },
  { email: "tobias.reyne@example.com", name: "Tobias Reyne", roles: { fernhollow: "builder" } },
  { email: "ilse.varga@example.com", name: "Ilse Varga", roles: { fernhollow: "builder" } },
  { email: "corin.batt@example.com", name: "Corin Batt", roles: { fernhollow: "bookkeeper" } },
  { email: "nadia.fensome@example.com", name: "Nadia Fensome", roles: { fernhollow: "client" } },
  { email: "otto.lindqvist@example.com", name: "Otto Lindqvist", roles: { fernhollow: "client" } },
  { email: "priya.ramnath@example.com", name: "Priya Ramnath", roles: { fernhollow: "client" } },
  { email: "dell.hargreave@example.com", name: "Dell Hargreave", roles: { quillmere: "owner" } },
  { email: "sam.okonjo@example.com", name: "Sam Okonjo", roles: { quillmere: "builder" } },
  { email: "june.whitlow@example.com", name: "June Whitlow", roles: { quillmere: "builder" } },
  { email: "rhea.castellan@example.com", name: "Rhea Castellan", roles: { quillmere: "bookkeeper" } },
  { email: "ben.ashdown@example.com", name: "Ben Ashdown", roles: { quillmere: "client" } },
  { email: "lucia.moreno@example.com", name: "Lucía Moreno", roles: { quillmere: "client" } },
  { email: "kit.farrow@example.com", name: "Kit Farrow", roles: { quillmere: "client" } },
  // The one person in both workshops, with a different role in each.
  { email: "wren.tallis@example.com", name: "Wren Tallis", roles: { fernhollow: "client", quillmere: "builder" } },
];
