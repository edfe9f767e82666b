import { JsonForm } from "@/components/account/json-form";

export const metadata = { title: "Forgot your password?" };

export default function ForgotPasswordPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Forgot your password?</h1>
      <p>Enter the address you sign in with. We will e-mail a link to choose a new password; it works once, for 1 hour.</p>
      <JsonForm
        url="/api/account/password-reset"
        schema="email"
        fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email" }]}
        submitLabel="E-mail me a link"
        busyLabel="Sending…"
        testId="forgot"
      />
    </section>
  );
}
