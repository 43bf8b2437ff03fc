/** PRODUCT.md "Cautions", shown wherever results are shown (the API sends the same text with each answer). */
export const identifyCaution =
  'A library match proposes candidates; it does not confirm an identity. Confirm against an authentic ' +
  'standard run under the same conditions (spectrum and retention index) before reporting, and follow ' +
  "the laboratory's validated methods and the rules that apply to its work (forensic, clinical, environmental).";
