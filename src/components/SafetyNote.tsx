import { CautionIcon } from './CautionIcon';

/** The standing caution shown wherever experimental work is recorded. */
export function SafetyNote() {
  return (
    <p className="flex items-start gap-2 text-xs leading-relaxed text-ink-soft" data-testid="safety-note">
      <CautionIcon />
      <span>
        Safety: this notebook records work; it does not replace a risk assessment, your local safety rules or a licensed
        professional&rsquo;s judgement. Check hazards and controls before you start.
      </span>
    </p>
  );
}
