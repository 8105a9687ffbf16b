import type { Role } from "@/db/schema";

/** A demo account: invented name, `.example` address, a password printed by the demo command. */
export interface DemoPerson {
  email: string;
  name: string;
  role: Role;
  password: string;
}

/** One demo account per role; created only by the demo seed and flagged `is_demo`. */
export const DEMO_PEOPLE: readonly DemoPerson[] = [
  { email: "admin@leeway.example", name: "Irene Calloway", role: "admin", password: "leeway-admin" },
  { email: "planner@leeway.example", name: "Tomas Ferrante", role: "planner", password: "leeway-planner" },
  { email: "trainer@leeway.example", name: "Maud Okonkwo-Hale", role: "trainer", password: "leeway-trainer" },
  { email: "council@leeway.example", name: "Desmond Varga", role: "council", password: "leeway-council" },
];
