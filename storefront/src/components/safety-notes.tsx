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
          <strong className="font-medium">Under 3s:</strong> we add nothing that could come off — no buttons, beads,
          gems or loose appliqué — because small parts are a choking hazard. Thread ends are secured on every piece.
        </li>
        <li>
          <strong className="font-medium">Not sleepwear:</strong> children's sleepwear has its own flammability rules.
          Our garments are day wear; please don't use them as pyjamas or nightgowns.
        </li>
        <li>
          <strong className="font-medium">No neck cords:</strong> drawstrings at the hood or neck of children's clothes
          can catch and strangle, so we never add them.
        </li>
      </ul>
      <p className="mt-2 text-xs text-walnut-500">
        These notes are general guidance. Please follow the children's product rules of your own country.
      </p>
    </section>
  );
}
