import { JsonForm } from "@/components/account/json-form";

export const metadata = { title: "Prove your address" };

/** Opened from the sign-up mail. A button, not the GET itself, proves the address: mail scanners open links too. */
export default async function ProveAddressPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token = "" } = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Finish creating your account</h1>
      <p>Press the button to prove this address is yours. Then sign in.</p>
      <JsonForm url="/api/account/prove-address" schema="token" fields={[]} hidden={{ token }} submitLabel="This is my address" busyLabel="Proving…" doneHref="/sign-in?proven=1" testId="prove" />
    </section>
  );
}
