import type { ReplicaState } from "@/lib/db/replica";
import type { QueueState } from "@/lib/jobs/boss";

/**
 * What /api/health tells anyone who asks: states and figures, never a driver's error text (it names hosts,
 * ports and database users). Operators read the errors in the process log.
 */
export function publicHealth({ database, queue, replica }: { database: "up" | "down"; queue: QueueState; replica: ReplicaState }) {
  return {
    ok: true,
    database,
    queue: { state: queue.state, attempts: queue.attempts, since: queue.since },
    replica: { configured: replica.configured, usable: replica.usable, lagSeconds: replica.lagSeconds, checkedAt: replica.checkedAt },
  };
}
