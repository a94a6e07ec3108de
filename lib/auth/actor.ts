import type { Role, UnitSystem } from "@/db/schema";

/** Who is acting: the signed-in user as every permission decision sees them. */
export interface Actor {
  userId: string;
  firmId: string;
  role: Role;
  email: string;
  name: string;
  unitSystem: UnitSystem;
}
