import type { CuffPlan, HemPlan } from '@/lib/allowance/types';

interface Props {
  plan: CuffPlan | HemPlan;
}

/** Is there cloth enough below the mark? When there is not, NoFit says so instead, as the headline. */
export function ClothCheck({ plan }: Props) {
  const needs = (
    <>
      Needs <span className="measure font-extrabold">{plan.required.text}</span> below the mark.
    </>
  );
  if (plan.enough === null) {
    return <p className="rounded-md border-2 border-rule bg-card px-4 py-3 text-lg break-inside-avoid">{needs} Type the cloth below the mark to check it.</p>;
  }
  if (plan.enough) {
    return (
      <p className="rounded-md border-2 border-ok bg-ok-soft px-4 py-3 text-lg text-ok break-inside-avoid">
        <strong className="font-extrabold">Enough cloth.</strong> {needs}
        {plan.spare && (
          <>
            {' '}
            Spare: <span className="measure font-extrabold">{plan.spare.text}</span>.
          </>
        )}
      </p>
    );
  }
  return null;
}

/** The cloth is short: said first, as the headline, then what still fits (the customer's cuff on a shorter third section first), then the figures. */
export function NoFit({ plan }: Props) {
  const alt = plan.kind === 'cuff' ? plan.alternatives : null;
  return (
    <section
      aria-labelledby="nofit-heading"
      data-testid="no-fit"
      className="rounded-lg border-4 border-cut bg-cut-soft px-5 py-4 text-lg text-cut break-inside-avoid"
    >
      <h2 id="nofit-heading" className="text-3xl leading-tight font-extrabold">
        Does not fit: do not cut. Short by <span className="measure">{plan.shortBy?.text}</span>.
      </h2>
      {plan.kind === 'cuff' && alt && (
        <>
          <p className="mt-2 font-semibold text-ink">What still fits:</p>
          <ul className="ml-5 list-disc text-ink" data-testid="what-fits">
            {alt.shorterSection && (
              // The depth the customer chose, kept: only the hidden third section is shorter.
              <li>
                The <span className="measure font-extrabold">{plan.cuffDepth.text}</span> cuff as asked, with a shorter third section of{' '}
                <span className="measure font-extrabold">{alt.shorterSection.text}</span> (still room for the turn-under and a safe stitch).
              </li>
            )}
            <li>
              {alt.deepestCuff ? (
                <>
                  A shallower cuff of <span className="measure font-extrabold">{alt.deepestCuff.text}</span>, three equal sections.
                </>
              ) : (
                'No shallower cuff of a sensible depth.'
              )}
            </li>
            <li>
              A plain hem needs <span className="measure font-extrabold">{alt.plainHem.required.text}</span>: {alt.plainHem.fits ? 'fits.' : 'does not fit.'}
            </li>
            <li>
              A faced cuff needs <span className="measure font-extrabold">{alt.facedCuff.required.text}</span> of own cloth:{' '}
              {alt.facedCuff.fits ? 'fits.' : 'does not fit.'}
            </li>
          </ul>
        </>
      )}
      <p className="mt-2">
        This {plan.kind === 'cuff' ? 'cuff' : 'hem'} needs <span className="measure font-extrabold">{plan.required.text}</span> below the mark
        {plan.lines[0]?.aboveRawEdge ? (
          <>
            ; there is <span className="measure font-extrabold">{plan.lines[0].aboveRawEdge.text}</span>
          </>
        ) : null}
        .
      </p>
    </section>
  );
}
