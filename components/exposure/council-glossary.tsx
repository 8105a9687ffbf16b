import type { IntensityScaleId } from "@/lib/geo";

/** Plain words for the terms the council summary uses, in Leeway's own wording. */
export function CouncilGlossary({ scale }: { scale: IntensityScaleId }) {
  const scaleName = scale === "jma" ? "the JMA seismic intensity scale (0 to 7, with 5 and 6 split into lower and upper)" : "the Modified Mercalli Intensity scale (I to X)";
  return (
    <section className="space-y-2 break-inside-avoid" data-testid="glossary">
      <h2 className="text-lg font-bold">What the words mean</h2>
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[12rem_1fr]">
        <dt className="font-semibold">Warning seconds</dt>
        <dd>The time between the alert reaching a phone, siren or radio and the strong shaking reaching the same place. Shown rounded down to whole seconds.</dd>
        <dt className="font-semibold">Blind zone</dt>
        <dd>
          The area close to the earthquake where the shaking arrives before any alert can: zero warning seconds or fewer. People there get no time to act, whatever the
          system does; only a faster system or more stations nearby can shrink it.
        </dd>
        <dt className="font-semibold">Alerted</dt>
        <dd>Inside the area the alert is sent to: places where the system predicts at least the shaking it is set to warn about.</dd>
        <dt className="font-semibold">Intensity class</dt>
        <dd>
          How strongly the ground is predicted to shake at a place, on {scaleName}. Higher classes mean stronger shaking. Predictions come from published models of how
          shaking weakens with distance and grows on soft ground.
        </dd>
        <dt className="font-semibold">Protective action</dt>
        <dd>
          Something people can do before the shaking, such as drop, cover and hold on, or stopping a train. An action fits when the warning seconds cover the time to
          react plus the time the action takes.
        </dd>
        <dt className="font-semibold">Expected</dt>
        <dd>
          The predicted shaking is uncertain. An &ldquo;expected&rdquo; number adds up, for every person, the chance that their shaking turns out stronger (or weaker)
          than predicted. It is an average over many possible earthquakes like this one, not a count of particular people, and real events can differ from it a lot.
        </dd>
        <dt className="font-semibold">Scenario</dt>
        <dd>One imagined earthquake, chosen to help plan. It is not a forecast that this earthquake will happen.</dd>
      </dl>
    </section>
  );
}
