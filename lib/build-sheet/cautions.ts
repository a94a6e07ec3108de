/**
 * Safety cautions printed on every build sheet and plan. They defer to local building codes and
 * licensed professionals.
 */
export const BUILD_SHEET_CAUTIONS: readonly string[] = Object.freeze([
  "Mineral-wool and glass-wool fibres irritate skin, eyes and lungs: wear gloves, long sleeves, eye protection and a dust mask or respirator; cut outdoors or with dust extraction, and keep the fibres covered by the fabric.",
  "Use fabrics, facings and fill with a fire rating suitable for interior finishes under your local codes; keep panels and traps clear of heat sources and light fittings.",
  "Heavy traps and panels must be fixed into the structure (studs, joists, masonry) with anchors rated for the load; an overhead trap hangs over people and a floor-standing trap can topple without a tie to the wall.",
  "Mind wiring and pipes behind walls and ceilings before drilling: check with a detector and the building's drawings.",
  "Measurement test signals can be loud: protect your hearing and warn others in the building.",
  "These notes do not replace local building codes: where in doubt, defer to them and to licensed professionals.",
]);
