import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

export default function HomePage() {
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl font-bold tracking-tight">Suspension set up for you, not for the average rider</h1>
      <p className="max-w-2xl text-lg text-stone-700">
        Tell the shop about you, your riding and your bike. A tuner works out the springs, preload, sag
        and clicker settings, and e-mails you a setup sheet you can follow in your own garage.
      </p>
      <div className="flex flex-wrap gap-3">
        <Link href="/my-requests" className={buttonClass("secondary")}>
          See my requests
        </Link>
      </div>
    </div>
  );
}
