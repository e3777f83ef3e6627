import { redirect } from "next/navigation";

export default async function VendorHome({ params }: { params: Promise<{ vendor: string }> }) {
  redirect(`/${(await params).vendor}/library`);
}
