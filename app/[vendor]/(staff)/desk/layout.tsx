import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("desk.use", "desk");
