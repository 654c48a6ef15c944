/** The invented wall used by the rendering tests (made-up layers and values). */
import type { Construction } from "../../src/project/model.ts";

const at = (file: string, line: number) => ({ file, line, col: 1 });

/** The construction block text of the invented wall. */
export const WALL_SOURCE = [
  "```construction",
  "id: EW-9",
  "name: Rendered block wall",
  "layers:",
  "  - { material: lime-render, thickness: 15 mm }",
  "  - { material: eps-board, thickness: 120 mm }",
  "  - { name: cavity, resistance: 0.18 m^2 K/W }",
  "  - { material: clay-block, thickness: 175 mm }",
  "  - { name: gypsum plaster, thickness: 12.5 mm, conductivity: 0.21 W/(m K), density: 700 kg/m^3, specific-heat: 1000 J/(kg K) }",
  "```",
].join("\n");

/** The invented wall: 15 mm render, 120 mm EPS, 0.18 cavity, 175 mm clay block, 12.5 mm plaster. */
export function wall(name = "Rendered block wall", layerName = "lime render"): Construction {
  return {
    id: "EW-9",
    name,
    heatFlow: "horizontal",
    outsideResistance: 0.04,
    outsideResistanceDefaulted: true,
    insideResistance: 0.13,
    insideResistanceDefaulted: true,
    timestepS: 3600,
    at: at("walls.md", 5),
    layers: [
      {
        kind: "massive",
        thicknessM: 0.015,
        conductivity: 0.8,
        density: 1600,
        specificHeat: 1000,
        name: layerName,
        materialId: "lime-render",
        source: "invented test value",
        at: at("walls.md", 9),
      },
      {
        kind: "massive",
        thicknessM: 0.12,
        conductivity: 0.035,
        density: 20,
        specificHeat: 1450,
        name: "EPS board",
        materialId: "eps-board",
        source: "invented test value",
        at: at("walls.md", 10),
      },
      { kind: "resistive", resistance: 0.18, name: "cavity", source: "", at: at("walls.md", 11) },
      {
        kind: "massive",
        thicknessM: 0.175,
        conductivity: 0.52,
        density: 1400,
        specificHeat: 900,
        name: "clay block",
        materialId: "clay-block",
        source: "invented library value",
        at: at("walls.md", 12),
      },
      {
        kind: "massive",
        thicknessM: 0.0125,
        conductivity: 0.21,
        density: 700,
        specificHeat: 1000,
        name: "gypsum plaster",
        source: "",
        at: at("walls.md", 13),
      },
    ],
  };
}
