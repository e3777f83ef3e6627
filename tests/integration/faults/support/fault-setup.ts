import { inject } from "vitest";

import { faultSmtpPort } from "./fault-env";

// Before each fault test file imports the app: its own database, its own SMTP port, a fast queue.
process.env.DATABASE_URL = inject("faultDatabaseUrl");
process.env.JOBS_WORKER = "off";
process.env.SMTP_HOST = "127.0.0.1";
process.env.SMTP_PORT = String(faultSmtpPort());
process.env.JOBS_POLL_SECONDS = "0.5";
process.env.JOBS_START_ATTEMPTS = "2";
process.env.JOBS_RETRY_DELAY_SECONDS = "1";
