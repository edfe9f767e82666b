import { JsonForm } from "@/components/account/json-form";

export const metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token = "" } = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Choose a new password</h1>
      <p>Every device signed in to your account will be signed out.</p>
      <JsonForm
        url="/api/account/password-reset/confirm"
        schema="resetConfirm"
        fields={[{ name: "password", label: "New password", type: "password", autoComplete: "new-password", hint: "At least 8 characters, at most 72 bytes; common passwords are refused." }]}
        hidden={{ token }}
        submitLabel="Save the new password"
        busyLabel="Saving…"
        doneHref="/sign-in?reset=1"
        testId="reset"
      />
    </section>
  );
}
