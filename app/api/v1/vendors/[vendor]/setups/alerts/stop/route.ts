import { stopLinkRoute } from "@/lib/http/stop-link-route";

// GET|POST /api/v1/vendors/{vendor}/setups/alerts/stop?token=…: the signed stop link of change alerts.
export const { GET, POST } = stopLinkRoute("change-alerts", "change_alerts", {
  ask: "Stop change alerts?",
  askText:
    "You will get no more e-mails about new versions of sheets you saved setups from. You can turn them back on in your mail preferences.",
  button: "Stop change alerts",
  done: "Change alerts stopped",
  doneText:
    "You will get no more e-mails about new versions of sheets you saved setups from. You can turn them back on in your mail preferences.",
  broken: "The stop link is incomplete or was changed. Turn change alerts off in your mail preferences instead.",
});
