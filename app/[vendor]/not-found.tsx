import { NotFoundMessage } from "@/components/ui/not-found-message";

export default function VendorNotFound() {
  return <NotFoundMessage />;
}
