import "server-only";

import { createStopToken, readStopToken } from "@/lib/mail/stop-token";

type Who = { vendorId: string; userId: string };

export const createAlertStopToken = (who: Who): string => createStopToken("change-alerts", who);
export const readAlertStopToken = (token: string): Who | null => readStopToken("change-alerts", token);
