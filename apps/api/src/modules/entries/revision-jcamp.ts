import type { RevisionView } from './revision-view';

/** What the JCAMP-DX writer needs from a revision: title, peaks, formula and the conditions. */
export function revisionToJcampInput(v: RevisionView) {
  const c = v.conditions as { ionizationEnergyEv?: number; instrumentType?: string; inlet?: string };
  return {
    title: `${v.name} (${v.label})${v.simulated ? ' simulated - demo only' : ''}`,
    peaks: v.peaks,
    formula: v.formula,
    ...(v.casRn ? { casRn: v.casRn } : {}),
    molecularWeight: v.nominalMass,
    ...(c.ionizationEnergyEv !== undefined ? { ionizationEnergyEv: c.ionizationEnergyEv } : {}),
    ionizationMode: 'EI+',
    ...(c.instrumentType ? { spectrometerType: c.instrumentType } : {}),
    ...(c.inlet ? { inlet: c.inlet } : {}),
    ...(v.retentionIndex ? { retentionIndex: v.retentionIndex.value } : {}),
    labels: {
      '$IONFOLIO ACCESSION': v.accession,
      '$IONFOLIO REVISION': String(v.number),
      '$IONFOLIO CONTENT SHA256': v.contentSha256,
    },
  };
}
