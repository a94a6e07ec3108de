export type { AirProperties, Incidence, Layer, PorousProperties, SpectrumPoint } from "./types";
export { DEFAULT_AIR } from "./types";
export { LIMITS } from "./limits";
export { DELANY_BAZLEY_COEFFICIENTS, DELANY_BAZLEY_RANGE, delanyBazley, delanyBazleyParameter } from "./delany-bazley";
export { MIKI_COEFFICIENTS, MIKI_RANGE, miki } from "./miki";
export { gaussLegendre, type QuadratureRule } from "./gauss-legendre";
export { ANGLE_NODES, FIELD_INCIDENCE_MAX_DEG, fieldIncidenceAverage, parisRandomIncidence } from "./incidence";
export { absorptionSpectrum, type SpectrumOptions } from "./absorption-spectrum";
