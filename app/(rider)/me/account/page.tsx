import { JsonForm } from "@/components/account/json-form";
import { getActor } from "@/lib/server/auth/actor";

export const metadata = { title: "Account and sign-in" };
export const dynamic = "force-dynamic";

const PASSWORD_HINT = "At least 8 characters, at most 72 bytes; common passwords are refused.";
const current = { name: "password", label: "Current password", type: "password", autoComplete: "current-password" };

/** Password, address, sessions, your data and deleting the account. Each change asks for the password again. */
export default async function AccountSettingsPage() {
  const actor = (await getActor())!;
  return (
    <section className="space-y-6">
      <h1 className="text-2xl font-bold">Account and sign-in</h1>
      <p className="text-loam-700">
        Signed in as <strong className="[overflow-wrap:anywhere]">{actor.email}</strong>.
      </p>

      <section aria-labelledby="h-password" className="space-y-2">
        <h2 id="h-password" className="text-lg font-bold">Change password</h2>
        <p className="text-sm text-loam-700">Every device, this one included, is signed out afterwards.</p>
        <JsonForm
          url="/api/me/password"
          schema="changePassword"
          fields={[
            { ...current, name: "currentPassword" },
            { name: "newPassword", label: "New password", type: "password", autoComplete: "new-password", hint: PASSWORD_HINT },
          ]}
          submitLabel="Change password"
          busyLabel="Saving…"
          doneHref="/sign-in?reset=1"
          testId="change-password"
        />
      </section>

      <section aria-labelledby="h-email" className="space-y-2">
        <h2 id="h-email" className="text-lg font-bold">Change e-mail address</h2>
        <p className="text-sm text-loam-700">We send a link to the new address; the change counts once it is opened. The old address gets a notice.</p>
        <JsonForm
          url="/api/me/email"
          schema="changeEmail"
          fields={[{ name: "newEmail", label: "New address", type: "email", autoComplete: "email" }, current]}
          submitLabel="Send the link"
          busyLabel="Sending…"
          testId="change-email"
        />
      </section>

      <section aria-labelledby="h-sessions" className="space-y-2">
        <h2 id="h-sessions" className="text-lg font-bold">Sign out everywhere</h2>
        <p className="text-sm text-loam-700">Ends every session on every phone and computer, this one too. Use it if you lost a device or signed in somewhere public.</p>
        <JsonForm url="/api/me/sign-out-everywhere" schema="password" fields={[current]} submitLabel="Sign out everywhere" busyLabel="Signing out…" doneHref="/sign-in" testId="sign-out-everywhere" />
      </section>

      <section aria-labelledby="h-data" className="space-y-2">
        <h2 id="h-data" className="text-lg font-bold">Download my data</h2>
        <p className="text-sm text-loam-700">Your account, setups, ride logs and notice subscriptions, as one JSON file.</p>
        <a href="/api/me/export" download className="btn-quiet">Download my data</a>
      </section>

      <section aria-labelledby="h-delete" className="space-y-2">
        <h2 id="h-delete" className="text-lg font-bold text-brick-600">Delete my account</h2>
        <p className="text-sm text-loam-700">
          Your setups, ride logs and subscriptions are deleted and you get no more e-mails. Reports you wrote as park staff stay in the park&apos;s records, signed
          &ldquo;former staff member&rdquo;. This cannot be undone. The last manager of a park must make someone else manager first.
        </p>
        <JsonForm url="/api/me" method="DELETE" schema="password" fields={[current]} submitLabel="Delete my account" busyLabel="Deleting…" doneHref="/?account=deleted" danger testId="delete-account" />
      </section>
    </section>
  );
}
