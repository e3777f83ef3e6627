import { areaLayout } from "@/components/shell/area-layout";

export default areaLayout("library.read", "library");
