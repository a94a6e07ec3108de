import { type Kysely, sql, type Transaction } from "kysely";
import type { Database, Role, UnitSystem, UserRow } from "../schema";

type Db = Kysely<Database> | Transaction<Database>;

export interface Member {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  invited: boolean; // true until the person has set a password
  unitSystem: UnitSystem;
  createdAt: Date;
}

export function toMember(r: UserRow): Member {
  return { id: r.id, email: r.email, name: r.name, role: r.role, active: r.active, invited: r.password_hash === null, unitSystem: r.unit_system, createdAt: r.created_at };
}

export async function findUserByEmail(db: Db, email: string): Promise<UserRow | undefined> {
  return db.selectFrom("users").selectAll().where(sql`lower(email)`, "=", email.toLowerCase()).executeTakeFirst();
}

export async function listMembers(db: Db, firmId: string): Promise<Member[]> {
  const rows = await db.selectFrom("users").selectAll().where("firm_id", "=", firmId).orderBy("role").orderBy("name").execute();
  return rows.map(toMember);
}

export async function findMember(db: Db, firmId: string, userId: string): Promise<Member | undefined> {
  const row = await db.selectFrom("users").selectAll().where("firm_id", "=", firmId).where("id", "=", userId).executeTakeFirst();
  return row ? toMember(row) : undefined;
}

export async function firmName(db: Db, firmId: string): Promise<string> {
  const row = await db.selectFrom("firms").select("name").where("id", "=", firmId).executeTakeFirstOrThrow();
  return row.name;
}

export async function countActiveOwners(db: Db, firmId: string): Promise<number> {
  const row = await db.selectFrom("users").select(db.fn.countAll<number>().as("n")).where("firm_id", "=", firmId).where("role", "=", "owner").where("active", "=", true).executeTakeFirstOrThrow();
  return Number(row.n);
}
