import { PrivateLibraryNote } from "@/components/shell/private-library-note";
import { NotFoundMessage } from "@/components/ui/not-found-message";

export default async function VendorNotFound() {
  return (await PrivateLibraryNote()) ?? <NotFoundMessage />;
}
