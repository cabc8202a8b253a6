// Validate the environment before anything starts; one line per problem, exit 1.
import { EnvError, parseEnv } from "@/server/env";

try {
  parseEnv(process.env);
} catch (err) {
  console.error(`sagline: error: ${err instanceof EnvError ? err.message : String(err)}`);
  process.exit(1);
}
