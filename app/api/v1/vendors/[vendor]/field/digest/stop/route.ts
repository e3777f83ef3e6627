import { stopLinkRoute } from "@/lib/http/stop-link-route";

// GET|POST /api/v1/vendors/{vendor}/field/digest/stop?token=…: the signed stop link of the weekly digest.
export const { GET, POST } = stopLinkRoute("weekly-digest", "weekly_digest", {
  ask: "Stop the weekly digest?",
  askText: "You will get no more weekly Field-results digests for this vendor. You can turn it back on from Drafting → Field results.",
  button: "Stop the weekly digest",
  done: "Weekly digest stopped",
  doneText: "You will get no more weekly Field-results digests. You can turn it back on from Drafting → Field results.",
  broken: "The stop link is incomplete or was changed. Turn the digest off on the Field results page instead.",
});
