import path from "node:path";

import { knexConfig } from "./lib/db/config";

const config = {
  ...knexConfig(),
  migrations: { directory: path.join(import.meta.dirname, "migrations"), extension: "ts", loadExtensions: [".ts"] },
};

export default config;
