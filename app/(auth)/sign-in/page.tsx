import type { Metadata } from "next";
import { RiderLinkForm } from "@/components/auth/rider-link-form";
import { StaffSignInForm } from "@/components/auth/staff-sign-in-form";
import { safeNextPath } from "@/lib/validations/auth";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string | string[] }> }) {
  const { next } = await searchParams;
  const destination = safeNextPath(typeof next === "string" ? next : undefined, "/shop");
  return (
    <div className="flex flex-col gap-8">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <div className="grid grid-cols-1 gap-6 md:grid-cols-2">
        <section aria-labelledby="staff-heading" className="rounded-xl border border-stone-200 bg-white p-5 shadow-sm">
          <h2 id="staff-heading" className="mb-1 text-lg font-semibold">
            Shop staff
          </h2>
          <p className="mb-4 text-sm text-stone-600">Tuners and the shop owner sign in with a password.</p>
          <StaffSignInForm next={destination} />
        </section>
        <section aria-labelledby="rider-heading" className="rounded-xl border border-stone-200 bg-white p-5 shadow-sm">
          <h2 id="rider-heading" className="mb-1 text-lg font-semibold">
            Riders
          </h2>
          <p className="mb-4 text-sm text-stone-600">
            No password needed: we e-mail you a link that opens all your setup requests.
          </p>
          <RiderLinkForm />
        </section>
      </div>
    </div>
  );
}
