// Setup-sheet test helpers over HTTP: a commission walked to final setup through the real routes,
// and a sheet inside the common-practice ranges for the six-string preset.
import { DEFAULT_BUILD_STAGES } from "@/lib/workflow/stages";
import type { SetupSheetView } from "@/lib/schemas/setup-sheet-out";
import { approveSpec, base, move, openCommission } from "./commission-helpers";
import type { TestWorkshop } from "./fixtures";
import type { HttpSession } from "./session";

export interface Sessions {
  owner: HttpSession;
  builder: HttpSession;
  bookkeeper: HttpSession;
  client: HttpSession;
}

/** Opens a commission (price 3000.00, deposit 900.00), approves the six-string spec, pays the deposit and advances it to final setup. */
export async function commissionInFinalSetup(s: Sessions, ws: TestWorkshop) {
  const c = await openCommission(s.owner, ws);
  await approveSpec(s.builder, s.client, ws, c.id);
  const paid = await s.bookkeeper.fetch(`${base(ws)}/${c.id}/payments`, { method: "POST", json: { kind: "deposit", amountMinor: 90_000, reference: "Deposit transfer" } });
  if (paid.status !== 201) throw new Error(`deposit ${paid.status}`);
  for (let i = 0; i < DEFAULT_BUILD_STAGES.length; i++) {
    const r = await move(s.builder, ws, c.id, "advance");
    if (r.status !== 200) throw new Error(`advance ${r.status} ${await r.text()}`);
  }
  return c;
}

/** A six-string sheet inside the default guitar ranges (mm, N), string 1 sharp by `cents1`. */
export function goodSheet(cents1 = 0.8) {
  return {
    strings: [1, 2, 3, 4, 5, 6].map((n) => ({ string: n, actionAt12Mm: n > 3 ? 2.0 : 1.6, nutSlotAt1Mm: 0.1, intonationCents: n === 1 ? cents1 : 0.5 })),
    neck: { reliefMm: 0.2, reliefAtFret: 8, trussRodNotes: "An eighth of a turn, settled overnight" },
    pickups: [
      { label: "Bridge", bassSideMm: 2.4, trebleSideMm: 1.6 },
      { label: "Neck", bassSideMm: 2.6, trebleSideMm: 2.0 },
    ],
    electronics: { checks: { jack_output: true, selector_positions: true, pots_sweep: true, string_ground: true }, notes: "" },
    notes: "",
  };
}

export const sheetUrl = (ws: TestWorkshop, id: number) => `${base(ws)}/${id}/setup-sheet`;

export async function getSheet(s: HttpSession, ws: TestWorkshop, id: number, query = "") {
  return s.json<{ setup: SetupSheetView }>(`${sheetUrl(ws, id)}${query}`);
}

export async function putSheet(s: HttpSession, ws: TestWorkshop, id: number, values: unknown) {
  return s.json<{ setup: SetupSheetView; error?: { code: string; issues: Array<{ path: string; message: string }> } }>(sheetUrl(ws, id), { method: "PUT", json: values });
}

export async function signSheet(s: HttpSession, ws: TestWorkshop, id: number, revision: number) {
  return s.json<{ setup: SetupSheetView; error?: { code: string; message: string } }>(`${sheetUrl(ws, id)}/sign`, { method: "POST", json: { revision } });
}
