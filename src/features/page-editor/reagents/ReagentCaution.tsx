import { CautionIcon } from '../../../components/CautionIcon';

/** The standing caution under every reagent table (DESIGN.md, Cautions). */
export function ReagentCaution() {
  return (
    <p className="flex items-start gap-2 border-t border-fold bg-reed-100/40 px-4 py-2 text-xs leading-relaxed text-ink-soft" data-testid="reagents-caution">
      <CautionIcon />
      <span>
        Hazard notes are the chemist&rsquo;s own entries; Quillane neither checks nor completes them. Read the supplier&rsquo;s
        safety data sheet for every reagent. This notebook does not replace a risk assessment, local safety rules or a licensed
        professional&rsquo;s judgement.
      </span>
    </p>
  );
}
