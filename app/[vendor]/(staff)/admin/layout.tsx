import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("members.manage", "admin");
