import "server-only";
import { getEnv } from "@/lib/env";
import { connect } from "./connect";

const env = getEnv();

/** The app's one database handle (embedded file by default, a libSQL server when DATABASE_URL says so). */
export const { db, client } = connect(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
