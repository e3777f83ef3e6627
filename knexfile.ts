import path from "node:path";

import { knexConfig } from "./lib/db/config";

export default {
  ...knexConfig(),
  migrations: { directory: path.join(import.meta.dirname, "migrations"), extension: "ts", loadExtensions: [".ts"] },
};
