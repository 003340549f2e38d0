import { requirePage } from "@/lib/server/session";
import { VenuesManager } from "@/components/admin/venues-manager";

export const metadata = { title: "Venues" };

export default async function VenuesPage() {
  await requirePage("admin:venues");
  return (
    <div className="grid gap-6">
      <h1 className="font-serif text-3xl font-semibold">Venues</h1>
      <p className="text-ink-2">
        Journals and book series. A methods venue publishes methods guidance: works from it count as methods sources in
        trails.
      </p>
      <VenuesManager />
    </div>
  );
}
