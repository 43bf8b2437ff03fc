/** PRODUCT.md "Cautions": sent with every identify answer so that tools can show it beside results. */
export const IDENTIFY_CAUTION =
  'A library match proposes candidates; it does not confirm an identity. Confirm against an authentic ' +
  'standard run under the same conditions (spectrum and retention index) before reporting, and follow ' +
  "the laboratory's validated methods and the rules that apply to its work (forensic, clinical, environmental).";
