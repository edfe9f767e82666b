import { SignUpForm } from "./sign-up-form";

export const metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Create a rider account</h1>
      <p className="text-loam-700">Save your bike setups, get today&apos;s pressure band and hear about closures.</p>
      <SignUpForm />
    </section>
  );
}
