// Fills shared by the budget strip and its close-up: brass for connectors, the station fill for devices.
export const SEGMENT_FILL = {
  connector: "color-mix(in srgb, var(--c-brass) 38%, var(--c-surface))",
  station: "var(--c-station)",
  camera: "var(--c-sunken)",
} as const;
