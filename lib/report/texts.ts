/** Fixed wording of the report: cautions, disclaimer, methods and their limits. */

export const CAUTIONS: { title: string; text: string }[] = [
  {
    title: "Mineral and glass wool",
    text: "The fibres irritate skin, eyes and airways. Wear gloves, long sleeves, eye protection and a dust mask or respirator; cut outdoors or with dust extraction; keep the fill covered with fabric once built.",
  },
  {
    title: "Fire",
    text: "Use fills, facings and fabrics whose fire rating suits interior finishes under your local building code; keep treatment clear of heat sources and light fittings.",
  },
  {
    title: "Heavy traps and panels",
    text: "Fix them into the structure (studs, joists or masonry) with anchors rated for the load, never to the wall board alone; anything over people's heads needs particular care.",
  },
  {
    title: "Behind the walls",
    text: "Before drilling, find wiring, pipes and ducts behind walls and ceilings (a detector, the building's drawings, or an electrician).",
  },
  {
    title: "Loud test signals",
    text: "Measurement sweeps and noise can be loud: protect your hearing and that of others, and raise the level gradually.",
  },
];

export const DISCLAIMER =
  "This report is a recommendation based on a calculation of the room as described to us; it is not a building design. Local building codes, fire regulations and the advice of licensed professionals (builders, electricians, structural engineers) take precedence over anything written here. Results in a real room differ from predictions, most of all at low frequency; we recommend a measurement after the work.";

export const METHODS: { title: string; text: string }[] = [
  {
    title: "Room modes",
    text: "Rayleigh's formula for a rigid rectangular box, f = (c/2) · [(nx/L)² + (ny/W)² + (nz/H)²]^½, with c from the air temperature. Real walls flex and leak, which lowers and damps the modes a little.",
  },
  {
    title: "Schroeder frequency",
    text: "fs = 2000 · (T/V)^½, with T the predicted mid-frequency (500 Hz / 1 kHz) time of the scenario. Below it, single modes dominate and diffuse-field figures (RT60, α) describe the room only roughly.",
  },
  {
    title: "Modal response at the seats",
    text: "A modal sum of the rigid box (all modes up to 400 Hz, one damping for all modes from the predicted low-frequency Eyring time). The level is relative; compare shapes and differences between scenarios, not absolute values.",
  },
  {
    title: "Porous absorbers",
    text: "Delany–Bazley and Miki models of the fill from its airflow resistivity (ISO 9053), transfer of the surface impedance through the layers, random incidence (Paris integral). The models are fitted for ρ0·f/σ between 0.01 and 1 and become rough outside that range and below the Schroeder frequency.",
  },
  {
    title: "Reverberation time",
    text: "Sabine and Eyring per octave band (63 Hz – 8 kHz), air absorption per ISO 9613-1 at the room's temperature and humidity. Both assume a diffuse field, which small rooms do not have at low frequency.",
  },
  {
    title: "Ratings",
    text: "αw and absorption class per ISO 11654 from one-third-octave α (200 Hz – 5 kHz); NRC and SAA per ASTM C423 from the same modelled α (not from a laboratory test).",
  },
  {
    title: "Targets",
    text: "The listening-room target of ITU-R BS.1116 / EBU Tech 3276 (Tm = 0.25 · (V/100 m³)^(1/3) s, with its tolerance mask), or a flat small-room band chosen by the engineer.",
  },
];
