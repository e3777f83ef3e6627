import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("support.use", "support");
