import Link from "next/link";
import { HeroTrain } from "@/components/home/hero-train";
import { SafetyNote } from "@/components/safety-note";
import { ButtonLink } from "@/components/ui/button";

const ROLES = [
  { title: "Imagers", text: "Pick your telescope, corrector, wheel and camera. Trainyard finds the adapters and spacers that join them at the right back focus, counts what you already own, and lists what is left to buy." },
  { title: "Shops", text: "Answer the “what do I need?” question with parts you actually stock, at your prices, and turn the answer into an order." },
  { title: "Moderators", text: "Save a checked answer as a short link, mark it as a reference build, and post it. It re-checks itself when the catalog changes." },
];

export default function HomePage() {
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-8 pt-4 lg:grid-cols-[1.1fr_1fr]">
        <div>
          <p className="text-sm font-medium uppercase tracking-[0.18em] text-brass-ink">Imaging trains that reach focus</p>
          <h1 className="mt-3 text-4xl font-semibold leading-tight tracking-tight text-ink sm:text-5xl">What joins this scope to this camera — at the right spacing?</h1>
          <p className="mt-4 max-w-xl text-lg text-muted">
            Every joint has to mate — thread, pitch, gender, barrel into holder — and the sensor has to land at the
            corrector&apos;s back focus, counting the extra path the filter glass adds. Trainyard works it out, draws it, and saves it as a link.
          </p>
          <div className="mt-6 flex flex-wrap gap-3">
            <ButtonLink href="/plan">Open the planner</ButtonLink>
            <ButtonLink href="/parts" variant="secondary">Browse parts</ButtonLink>
          </div>
        </div>
        <div className="rounded-xl border border-line bg-surface p-5"><HeroTrain /></div>
      </section>
      <section className="grid gap-4 md:grid-cols-3">
        {ROLES.map((r) => (
          <div key={r.title} className="rounded-lg border border-line bg-surface p-5">
            <h2 className="font-semibold text-ink">{r.title}</h2>
            <p className="mt-2 text-sm text-muted">{r.text}</p>
          </div>
        ))}
      </section>
      <section className="grid gap-4 md:grid-cols-[1fr_1fr]">
        <div className="rounded-lg border border-line bg-surface p-5 text-sm">
          <h2 className="font-semibold text-ink">The rules it checks</h2>
          <ul className="mt-2 list-disc space-y-1 pl-5 text-muted">
            <li>Threads mate only with the same size and pitch and the opposite gender: <span className="code">M42x1</span> looks like T-thread (<span className="code">M42x0.75</span>) but does not fit it.</li>
            <li>Filter glass pushes focus back by t·(n−1)/n — about a third of its thickness.</li>
            <li>Each part in the light path must be wide enough for the converging beam, or the corners vignette.</li>
          </ul>
          <Link href="/builds" className="mt-3 inline-block underline decoration-brass underline-offset-4">See reference builds</Link>
        </div>
        <SafetyNote />
      </section>
    </div>
  );
}
