import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";

export async function findUserByEmail({ email }: { email: string }) {
  return db.query.users.findFirst({ where: eq(users.email, email.trim().toLowerCase()) });
}

export async function findUserById({ id }: { id: number }) {
  return db.query.users.findFirst({ where: eq(users.id, id) });
}
