import { areaLayout } from "@/components/shell/area-layout";

// Pages for any signed-in member of this vendor (personal access tokens).
export default areaLayout("tokens.manage", "tokens");
