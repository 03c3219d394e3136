/**
 * The studio's standing cautions for children's garments. They are guidance only: the rules that apply are those of
 * the buyer's country, and the shop never claims compliance on a garment's behalf here.
 */
export function SafetyNotes() {
  return (
    <section aria-labelledby="safety-heading" className="text-sm text-walnut-700">
      <h2 id="safety-heading" className="font-semibold">
        Caring for little ones
      </h2>
      <ul className="mt-2 grid gap-2 sm:grid-cols-3">
        <li>
          <strong className="font-medium">Under 3s:</strong> buttons, beads, bows and appliqué that could come off are a
          choking hazard; a design that carries any says so in its safety notes. Thread ends are secured on every piece.
        </li>
        <li>
          <strong className="font-medium">Sleepwear:</strong> children's sleepwear has its own flammability rules. Each
          garment's page says whether it is made as day wear; please don't use day wear as pyjamas or nightgowns.
        </li>
        <li>
          <strong className="font-medium">Ties and neck fastenings:</strong> ribbon ties and fastenings round the neck
          can catch. Take such garments off before sleep; each garment's page lists its own notes.
        </li>
      </ul>
      <p className="mt-2 text-xs text-walnut-500">
        These notes are general guidance. Please follow the children's product rules of your own country.
      </p>
    </section>
  );
}
