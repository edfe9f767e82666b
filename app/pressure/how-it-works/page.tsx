import Link from "next/link";
import { CAUTIONS, RULE_SECTIONS, type Source } from "@/lib/pressure/pure/catalogue";

export const metadata = { title: "How the pressure band works" };

const SOURCE_STYLE: Record<Source, string> = {
  published: "bg-moss-100 text-moss-700",
  computed: "bg-moss-100 text-moss-700",
  "common practice": "bg-loam-100 text-loam-900",
  "our choice": "bg-loam-100 text-loam-900",
  safety: "bg-brick-100 text-brick-600",
};

export default function HowItWorksPage() {
  return (
    <article className="space-y-6">
      <header className="space-y-2">
        <h1 className="text-3xl font-extrabold tracking-tight">How the pressure band works</h1>
        <p className="max-w-prose text-lg text-loam-900">
          Every rule the band uses: what it does in plain words, its numbers and where they come from. The <em>how?</em> link beside each reason
          opens its rule here. Rules marked <em>common practice</em> are trade rules of thumb with no published source. Back to{" "}
          <Link href="/pressure" className="font-semibold underline">today&apos;s pressure</Link>.
        </p>
      </header>
      <nav aria-label="Sections" className="flex flex-wrap gap-2">
        {RULE_SECTIONS.map((s) => (
          <a key={s.id} href={`#${s.id}`} className="btn-quiet">{s.title}</a>
        ))}
      </nav>
      {RULE_SECTIONS.map((section) => (
        <section key={section.id} id={section.id} aria-labelledby={`${section.id}-title`} className="space-y-3">
          <h2 id={`${section.id}-title`} className="text-2xl font-bold">{section.title}</h2>
          <p className="max-w-prose text-loam-900">{section.intro}</p>
          <ul className="space-y-3">
            {section.rules.map((rule) => (
              <li key={rule.id} id={`rule-${rule.id}`} className="card space-y-1">
                <p className="text-lg font-semibold text-loam-900">{rule.plain}</p>
                <p className="text-loam-900"><span className="font-semibold">Numbers:</span> {rule.numbers}</p>
                <p className="text-sm text-loam-900">
                  <span className={`mr-2 rounded px-2 py-0.5 text-xs font-bold uppercase ${SOURCE_STYLE[rule.source.kind]}`}>{rule.source.kind}</span>
                  {rule.source.text}{" "}
                  <a href={`#rule-${rule.id}`} className="whitespace-nowrap text-loam-800 underline" aria-label={`Link to this rule (${rule.id})`}>Link to this rule</a>
                </p>
              </li>
            ))}
          </ul>
        </section>
      ))}
      <section aria-labelledby="cautions-title" className="rounded-xl border-l-8 border-flare-500 bg-flare-100 p-4">
        <h2 id="cautions-title" className="text-2xl font-bold">Always</h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 font-medium">
          {CAUTIONS.map((c) => <li key={c}>{c}</li>)}
        </ul>
      </section>
    </article>
  );
}
