/**
 * lib/reflections — first-order reflection points by the image-source method on the six surfaces of a
 * rectangular room, reflection zones over a listening area, a suggested panel set of standard sizes,
 * and placement checks (inside the surface, no overlaps, clear of openings). Pure TypeScript; bad
 * arguments throw TypeError/RangeError naming the field.
 * Frame: x = length (x = 0 front wall), y = width (y = 0 left wall), z = height (z = 0 floor); each
 * surface has its own (u, v): front/rear u = y, v = z; left/right u = x, v = z; floor/ceiling u = x, v = y.
 */
export { SURFACES, SURFACE_NAMES, surfaceFrame, surfaceSize, type Point3, type Room, type SurfaceId } from "./geometry";
export { reflectionPoint, type ReflectionPoint } from "./reflection-point";
export { firstReflections, listeningAreaSeats, reflectionZones, type Position, type SeatReflection, type Zone } from "./zones";
export { suggestPanels, type SuggestedPanelSet } from "./panels";
export { checkPlacement, cornerTrapFootprints, type PlacedItem, type PlacementProblem, type VerticalCorner } from "./placement";
export { placedItemSchema, point3Schema, positionSchema, reflectionRoomSchema, reflectionsRequestSchema, roomReflectionsRequestSchema, surfaceIdSchema, type ReflectionsRequest, type RoomReflectionsRequest } from "./schemas";
