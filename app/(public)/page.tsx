import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { getShopName } from "@/db/queries/settings";

export const metadata: Metadata = { title: "Suspension setup for your riding" };
export const dynamic = "force-dynamic";

const STEPS = [
  {
    title: "Tell us about you and your bike",
    text: "Your weight, how and where you ride, your bike and what feels wrong. Five minutes on your phone; add photos if you like.",
  },
  {
    title: "A tuner works out your setup",
    text: "Spring rates for fork and shock, preload, sag targets, oil level and starting clicker positions, checked by a person before you see them.",
  },
  {
    title: "Get your sheet, report your sag",
    text: "Download the setup sheet from your private page, fit the springs, measure sag and tell us: we confirm the choice or say what to change.",
  },
];

export default async function HomePage() {
  const shopName = await getShopName();
  return (
    <div className="flex flex-col gap-10">
      <section className="flex flex-col gap-4">
        <p className="text-sm font-semibold uppercase tracking-wide text-pine-700">{shopName}</p>
        <h1 className="text-3xl font-bold tracking-tight">Suspension set up for you, not for the average rider</h1>
        <p className="max-w-2xl text-lg text-stone-700">
          Off-road forks and shocks come sprung for a rider who is not you. Tell the shop about you, your riding and
          your bike: a tuner sizes the springs and settings and sends you a setup sheet you can follow in your own
          garage.
        </p>
        <div className="flex flex-col gap-3 min-[420px]:flex-row">
          <Link href="/request" className={buttonClass("primary", "min-h-12 text-lg")}>
            Start my setup request
          </Link>
          <Link href="/my-requests" className={buttonClass("secondary", "min-h-12")}>
            See my requests
          </Link>
        </div>
      </section>
      <section aria-labelledby="how-heading" className="flex flex-col gap-4">
        <h2 id="how-heading" className="text-2xl font-bold">
          How it works
        </h2>
        <ol className="grid grid-cols-1 gap-4 md:grid-cols-3">
          {STEPS.map((step, i) => (
            <li key={step.title} className="flex gap-4 rounded-xl border border-stone-200 bg-white p-4 md:flex-col">
              <span
                aria-hidden="true"
                className="flex h-10 w-10 shrink-0 items-center justify-center rounded-full bg-pine-700 text-lg font-bold text-white"
              >
                {i + 1}
              </span>
              <div>
                <h3 className="font-semibold">
                  <span className="sr-only">Step {i + 1}: </span>
                  {step.title}
                </h3>
                <p className="mt-1 text-stone-700">{step.text}</p>
              </div>
            </li>
          ))}
        </ol>
      </section>
      <section className="rounded-xl bg-amber-soft p-4 text-stone-800">
        <h2 className="font-semibold">No account needed</h2>
        <p className="mt-1">
          You get a private link by e-mail to follow your request. Already sent one? Sign in with your e-mail to see all
          your requests.
        </p>
      </section>
    </div>
  );
}
