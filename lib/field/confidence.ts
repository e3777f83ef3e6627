import { zForConfidence } from "./wilson";

/** The vendor's chosen confidence as z and as a label ("95 %"). */
export function confidenceOf(settings: { wilsonConfidence: number }) {
  const confidence = settings.wilsonConfidence;
  return {
    confidence,
    z: zForConfidence(confidence),
    label: `${(confidence * 100).toLocaleString("en-GB", { maximumFractionDigits: 1 })} %`,
  };
}

export const percent = (share: number) => `${(share * 100).toLocaleString("en-GB", { maximumFractionDigits: share < 0.1 ? 1 : 0 })} %`;
