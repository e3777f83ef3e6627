import path from "node:path";

export const root = path.resolve(import.meta.dirname, "../../../..");

/** Ports and folder of the fault tests' own services (FAULT_* to move them). */
export function faultPgEnv() {
  return {
    PG_DIR: process.env.FAULT_PG_DIR ?? path.join(root, ".tmp/fault-pg"),
    PG_PORT: process.env.FAULT_PG_PORT ?? "55490",
    PG_DB: "swarfbook_faults",
    PG_FSYNC: "off",
  };
}

export const faultSmtpPort = () => Number(process.env.FAULT_SMTP_PORT ?? 1190);
export const faultMailDevPort = () => Number(process.env.FAULT_MAILDEV_PORT ?? 1191);
