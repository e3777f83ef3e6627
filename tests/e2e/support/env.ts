// Where the app under test and its mail inbox live (set by scripts/test.sh; defaults: a developer's dev server).
export const BASE_URL = (process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
export const MAILDEV_URL = (process.env.MAILDEV_URL ?? "http://127.0.0.1:1080").replace(/\/$/, "");
export const SCREENSHOT_DIR = process.env.E2E_SCREENSHOT_DIR ?? "test-results/screenshots";
export const DEMO_PASSWORD = "swarfbook-demo";
