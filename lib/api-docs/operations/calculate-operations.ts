import { calculateResultSchema } from "@/content-schema/api-responses";
import { calculateBodySchema } from "@/content-schema/calculate";

import { calculateAnswer, calculateImperialExample, calculateMetricExample } from "../api-examples";
import type { ApiOperation } from "../api-operation";

export const calculateOperations: ApiOperation[] = [
  {
    method: "POST",
    path: "/api/v1/calculate",
    tag: "Calculate",
    summary: "Adapt one operation to a machine",
    description:
      "Every length, feed, speed, power and force names its unit, so a caller may mix systems. The answer carries both systems, the warnings and each step with its reason and source.",
    access: "public",
    rateLimit: { limit: 120, windowSeconds: 60 },
    body: calculateBodySchema,
    parsedIn: "lib/adapt/calculate/run-calculation.ts",
    requestExamples: {
      metric: { summary: "Metric: 6 mm two-flute slot on a 2.2 kW router", value: calculateMetricExample },
      imperial: { summary: "Imperial: 1/4 in two-flute profile on a 3 hp router", value: calculateImperialExample },
    },
    responses: {
      "200": {
        description: "The adapted numbers in both unit systems.",
        schema: calculateResultSchema,
        examples: {
          metric: { summary: "Answer to the metric example", value: calculateAnswer(calculateMetricExample) },
          imperial: { summary: "Answer to the imperial example", value: calculateAnswer(calculateImperialExample) },
        },
      },
    },
    errors: [413, 415],
  },
];
