/** The general caution shown on every screen that gives a recipe or a potential. */
export function SafetyCaution() {
  return (
    <p className="text-xs leading-snug text-ink-soft">
      Computed activities and potentials are model estimates: verify them against measurement. Read
      the safety data sheet of every reagent, and follow your institution&apos;s chemical hygiene
      plan and local rules.
    </p>
  );
}
