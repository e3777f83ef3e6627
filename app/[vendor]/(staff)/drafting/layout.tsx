import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("sheets.author", "drafting");
