/** Default softwood density, kg/m³ (from memory: typical of kiln-dried spruce/pine, 450–550). */
export const DEFAULT_WOOD_DENSITY_KG_M3 = 500;
/** Default fabric mass, kg/m² (from memory: a woven furnishing fabric, 0.2–0.4). */
export const DEFAULT_FABRIC_MASS_KG_M2 = 0.3;
/** Longest frame side without a centre rail, m (common practice). */
export const CENTRE_RAIL_ABOVE_M = 1.2;
/** Largest spacing of face rails on a corner trap, m (common practice). */
export const CORNER_RAIL_SPACING_M = 1.2;
/** Load per wall cleat or hanger used to count them, kg (common practice: each rated well above its share). */
export const KG_PER_CLEAT = 10;
/** Screws per frame joint (common practice). */
export const SCREWS_PER_JOINT = 2;
/** Spacing of screws fixing a face sheet round its edge, m (common practice). */
export const SHEET_SCREW_SPACING_M = 0.15;
/** Bracket spacing along a floor-standing trap (tip restraint) and an overhead trap, m (common practice). */
export const BRACKET_SPACING_M = { "floor-to-ceiling": 1.2, "wall-ceiling": 0.6 } as const;
/** Waste allowed when fill must be pieced from offcuts (common practice). */
export const PIECED_WASTE = 0.15;
