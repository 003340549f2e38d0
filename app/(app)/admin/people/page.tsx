import { requirePage } from "@/lib/server/session";
import { PeopleManager } from "@/components/admin/people-manager";

export const metadata = { title: "People" };

export default async function PeoplePage() {
  const actor = await requirePage("admin:users");
  return (
    <div className="grid gap-6">
      <h1 className="font-serif text-3xl font-semibold">People</h1>
      <PeopleManager selfId={actor.id} />
    </div>
  );
}
