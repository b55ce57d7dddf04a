import type { CalibrationOverlay } from '../geometry/calibration-lines';

const signed = (value: number) => `${value < 0 ? '−' : '+'}${Math.abs(value).toFixed(2)}`;

/**
 * Which parameters the map is drawn with: the programme's accepted calibration, or the
 * uncalibrated theory. Lives in the view (the URL's `calibrated` flag).
 */
export function CalibrationSwitch({ calibration, calibrated, onChange }: { calibration: CalibrationOverlay; calibrated: boolean; onChange: (calibrated: boolean) => void }) {
  return (
    <fieldset className="rounded-md border border-line bg-panel px-3 py-2 text-sm" data-testid="calibration-switch">
      <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">Drawn with</legend>
      <div className="flex flex-wrap gap-x-5 gap-y-1">
        <label className="flex cursor-pointer items-center gap-2">
          <input type="radio" name="map-calibration" className="h-4 w-4 accent-fjord-500" checked={calibrated} onChange={() => onChange(true)} />
          <span>
            Calibrated {calibration.dateLabel}{' '}
            <span className="text-ink-soft">
              (shift {signed(calibration.parameters.attractionShift)} ± {calibration.shiftStandardError.toFixed(2)} B2*)
            </span>
          </span>
        </label>
        <label className="flex cursor-pointer items-center gap-2">
          <input type="radio" name="map-calibration" className="h-4 w-4 accent-fjord-500" checked={!calibrated} onChange={() => onChange(false)} />
          Uncalibrated theory
        </label>
      </div>
    </fieldset>
  );
}
