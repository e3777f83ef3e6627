import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("bench.use", "bench");
