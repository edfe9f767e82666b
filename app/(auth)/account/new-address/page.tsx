import { JsonForm } from "@/components/account/json-form";

export const metadata = { title: "Confirm your new address" };

export default async function NewAddressPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token = "" } = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Confirm your new address</h1>
      <p>Your account will use this address from now on; every device will be signed out.</p>
      <JsonForm url="/api/account/email/confirm" schema="token" fields={[]} hidden={{ token }} submitLabel="Use this address" busyLabel="Saving…" doneHref="/sign-in?proven=1" testId="new-address" />
    </section>
  );
}
