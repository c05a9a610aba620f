// One colour per stage position for stacked charts and progress bars, from the theme's palette
// (charts need raw values). Stages beyond the list reuse it from the start.
const STAGE_COLORS = ["#c9ad72", "#b98f1d", "#8c3a31", "#4f7d3e", "#712e28", "#946f17", "#324f28", "#a84b3e", "#626b70", "#57442a", "#d8968a", "#3e4448"] as const;

export const DELIVERED_COLOR = "#4f7d3e";
export const ON_HOLD_COLOR = "#a9b0b3";

export function stageColor(index: number, key?: string): string {
  if (key === "on_hold") return ON_HOLD_COLOR;
  if (key === "delivered") return DELIVERED_COLOR;
  return STAGE_COLORS[index % STAGE_COLORS.length]!;
}
