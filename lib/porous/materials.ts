/**
 * A generic porous material with its typical airflow resistivity range. No brands: products vary
 * widely, so design with a measured or declared σ (ISO 9053) where one exists.
 */
export interface PorousMaterial {
  id: string;
  name: string;
  family: "mineral-wool" | "glass-fibre" | "polyester-fibre" | "open-cell-foam";
  /** nominal bulk density range, kg/m³ */
  densityKgM3: { min: number; max: number };
  /** airflow resistivity σ, Pa·s/m²: typical value and usual spread */
  flowResistivity: { min: number; typical: number; max: number };
  /** where the σ range comes from, stated honestly */
  source: string;
  /** handling and fire cautions */
  caution: string;
}

const FROM_MEMORY =
  "from memory: typical of published flow-resistivity data and manufacturers' declared values for this density (not read from a named table here); cross-checked against the Bies & Hansen (1980) estimate [from memory, moderate] at a 4–9 µm fibre diameter where fibrous";
const WOOL_CAUTION =
  "Mineral and glass fibres irritate skin, eyes and airways: cut and handle with gloves, long sleeves, eye protection and a particulate mask, and keep the fibres covered (fabric, facing). Fire classification depends on the product, its binder and facing, and on local building codes.";
const POLYESTER_CAUTION =
  "Polyester fibre is combustible and melts; its fire classification depends on the product and treatment. Check it against local building codes before use in a room.";
const FOAM_CAUTION =
  "Many open-cell foams are combustible and give off dense, toxic smoke; use only grades with a fire classification your local building code accepts for the room.";

/**
 * Catalogue of generic porous absorber materials in several densities, with typical σ ranges.
 * Every σ here is marked "from memory" in its `source`: treat it as a starting value.
 * @example POROUS_MATERIALS.find((m) => m.id === 'mineral-wool-45')?.flowResistivity.typical // 15000
 */
export const POROUS_MATERIALS: readonly PorousMaterial[] = Object.freeze([
  {
    id: "mineral-wool-35",
    name: "Mineral (stone) wool slab, light",
    family: "mineral-wool",
    densityKgM3: { min: 30, max: 40 },
    flowResistivity: { min: 7000, typical: 10_000, max: 15_000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "mineral-wool-45",
    name: "Mineral (stone) wool slab, medium",
    family: "mineral-wool",
    densityKgM3: { min: 40, max: 60 },
    flowResistivity: { min: 10_000, typical: 15_000, max: 25_000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "mineral-wool-100",
    name: "Mineral (stone) wool slab, dense",
    family: "mineral-wool",
    densityKgM3: { min: 80, max: 120 },
    flowResistivity: { min: 25_000, typical: 40_000, max: 70_000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "glass-fibre-16",
    name: "Glass-fibre blanket, light",
    family: "glass-fibre",
    densityKgM3: { min: 10, max: 20 },
    flowResistivity: { min: 3000, typical: 5000, max: 9000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "glass-fibre-32",
    name: "Glass-fibre board, medium",
    family: "glass-fibre",
    densityKgM3: { min: 24, max: 36 },
    flowResistivity: { min: 8000, typical: 13_000, max: 20_000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "glass-fibre-48",
    name: "Glass-fibre board, dense",
    family: "glass-fibre",
    densityKgM3: { min: 40, max: 60 },
    flowResistivity: { min: 15_000, typical: 25_000, max: 40_000 },
    source: FROM_MEMORY,
    caution: WOOL_CAUTION,
  },
  {
    id: "polyester-fibre-15",
    name: "Polyester fibre batt, light",
    family: "polyester-fibre",
    densityKgM3: { min: 10, max: 20 },
    flowResistivity: { min: 1500, typical: 3000, max: 6000 },
    source: "from memory: typical of published data for thermally bonded polyester batts of this density",
    caution: POLYESTER_CAUTION,
  },
  {
    id: "polyester-fibre-35",
    name: "Polyester fibre panel, dense",
    family: "polyester-fibre",
    densityKgM3: { min: 25, max: 50 },
    flowResistivity: { min: 5000, typical: 9000, max: 16_000 },
    source: "from memory: typical of published data for thermally bonded polyester panels of this density",
    caution: POLYESTER_CAUTION,
  },
  {
    id: "open-cell-foam-pu-30",
    name: "Open-cell polyurethane foam (acoustic grade)",
    family: "open-cell-foam",
    densityKgM3: { min: 20, max: 40 },
    flowResistivity: { min: 4000, typical: 10_000, max: 25_000 },
    source: "from memory: open-cell polyurethane foams spread widely with cell size and reticulation",
    caution: FOAM_CAUTION,
  },
  {
    id: "open-cell-foam-melamine-10",
    name: "Open-cell melamine foam",
    family: "open-cell-foam",
    densityKgM3: { min: 8, max: 12 },
    flowResistivity: { min: 8000, typical: 12_000, max: 20_000 },
    source: "from memory: typical of published data for melamine foam of this density",
    caution: FOAM_CAUTION,
  },
] satisfies PorousMaterial[]);

/**
 * Looks a material up by id; `undefined` when there is none.
 * @example porousMaterial('glass-fibre-32')?.name // 'Glass-fibre board, medium'
 */
export function porousMaterial(id: string): PorousMaterial | undefined {
  return POROUS_MATERIALS.find((m) => m.id === id);
}
