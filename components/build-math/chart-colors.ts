// Series colours for the charts, from the theme in tailwind.config.ts (charts need raw values).
export const CHART_COLORS = ["#712e28", "#b98f1d", "#4f7d3e", "#4d5459", "#c23a22", "#b7791f"] as const;
export const CHART_INK = "#3e4448";
export const CHART_GRID = "#ebe0c4";
export const CHART_BAND = "#dcebd6";
export const CHART_DANGER = "#c23a22";
