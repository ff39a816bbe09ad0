"use client";
// Uploading a photo or a manual for an item (stewards and coordinators).
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";

export function FileUpload({ itemId }: { itemId: string }) {
  const router = useRouter();
  const [purpose, setPurpose] = useState<"photo" | "manual">("photo");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const formElement = event.currentTarget;
    const data = new FormData(formElement);
    data.set("purpose", purpose);
    setBusy(true);
    const response = await fetch(`/api/gear/${itemId}/files`, { method: "POST", body: data });
    const body = await response.json();
    setBusy(false);
    setMessage(response.ok ? { ok: true, text: `${body.file.fileName} is added.` } : { ok: false, text: body.message ?? "The upload did not work." });
    if (response.ok) {
      formElement.reset();
      router.refresh();
    }
  };

  return (
    <form onSubmit={submit} className="mt-4 flex flex-wrap items-end gap-3" aria-label="Add a photo or manual">
      <label className="block font-bold">
        Add
        <select value={purpose} onChange={(event) => setPurpose(event.target.value as "photo" | "manual")} className="mt-1 block min-h-11 rounded-lg border border-slate-400 bg-white px-2">
          <option value="photo">a photo (JPEG, PNG, WebP; 8 MB)</option>
          <option value="manual">a manual (PDF; 20 MB)</option>
        </select>
      </label>
      <label className="block font-bold">
        File
        <input name="file" type="file" required accept={purpose === "photo" ? "image/jpeg,image/png,image/webp" : "application/pdf"} className="mt-1 block" />
      </label>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Uploading…" : "Upload"}
      </Button>
      {message && (
        <p role={message.ok ? "status" : "alert"} className={`w-full font-bold ${message.ok ? "text-copper-800" : "text-danger-600"}`}>
          {message.text}
        </p>
      )}
    </form>
  );
}
