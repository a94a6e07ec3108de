import { jsonError } from "@/lib/api/route";

// Every unknown /api/v1 path answers JSON, like the rest of the API.
const notFound = () => jsonError(404, "not_found", "There is no such API endpoint. See /api/v1/openapi.json.");

export const GET = notFound;
export const POST = notFound;
export const PUT = notFound;
export const PATCH = notFound;
export const DELETE = notFound;
