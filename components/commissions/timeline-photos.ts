// Where each stage's photos go in a commission's timeline (pure): under the newest move into that
// stage, so the photos of the stage the build is in sit at the top. Stages with photos but no
// such move (a stage since renamed away, a client's reference pictures before any move) are left
// over and shown after the timeline.
import type { StageHistoryEntry } from "@/lib/schemas/commission-out";

export function photoAnchors(history: ReadonlyArray<Pick<StageHistoryEntry, "id" | "to">>, stagesWithPhotos: readonly string[]): { byEntry: Map<number, string[]>; leftOver: string[] } {
  const newestInto = new Map<string, number>();
  for (const h of history) newestInto.set(h.to, h.id); // history is oldest first: the last one wins
  const byEntry = new Map<number, string[]>();
  const leftOver: string[] = [];
  for (const stage of stagesWithPhotos) {
    const entry = newestInto.get(stage);
    if (entry === undefined) leftOver.push(stage);
    else byEntry.set(entry, [...(byEntry.get(entry) ?? []), stage]);
  }
  return { byEntry, leftOver };
}
