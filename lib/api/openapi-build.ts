import { priceListInputSchema, progressInputSchema } from "@/lib/schemas/build-sheet";
import type { EndpointDoc } from "./openapi";

/** Build sheet, price list and site progress endpoints. */
export const BUILD_ENDPOINTS: EndpointDoc[] = [
  {
    method: "get",
    path: "/projects/{projectId}/build-sheet",
    summary: "The project's build sheet: per room the scenario to build and its items with their progress; per build type the cut list (with kerf), slabs, fabric, fixings, weight and mounting; totals and materials cost from the firm's price list; cautions (owner, engineer, the project's builders)",
    tag: "Build",
    query: [{ name: "units", description: "metric or imperial (default: the caller's setting)" }],
    success: 200,
  },
  { method: "get", path: "/price-list", summary: "The firm's price list and stock sizes, null before the owner sets one (owner, engineer, builder)", tag: "Build", success: 200 },
  { method: "put", path: "/price-list", summary: "Set the firm's price list and stock sizes (owner; send the version read, 0 for the first)", tag: "Build", body: priceListInputSchema, success: 200 },
  {
    method: "put",
    path: "/treatment-items/{itemId}/progress",
    summary: "Mark an item of the build sheet built and/or installed on a day, with a note (the project's builders, the owner)",
    tag: "Build",
    body: progressInputSchema,
    success: 200,
  },
];
