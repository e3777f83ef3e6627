export { formatDate } from "@/lib/ui/dates";
