import { requirePage } from "@/lib/server/session";
import { UploadForm } from "@/components/upload/upload-form";

export const metadata = { title: "Upload articles" };

export default async function UploadPage() {
  await requirePage("corpus:upload");
  return (
    <div className="grid gap-6">
      <h1 className="font-serif text-3xl font-semibold">Upload articles</h1>
      <p className="max-w-prose text-ink-2">
        Add open-access articles to the corpus. Each file is mined in the background; its status below moves from queued
        to done (or failed, with the reason) without reloading the page.
      </p>
      <UploadForm />
    </div>
  );
}
