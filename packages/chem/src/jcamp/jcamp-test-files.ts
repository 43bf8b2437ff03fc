// Invented JCAMP-DX files for the tests of this folder (simulated test data, no real spectrum).
// Layouts follow McDonald & Wilks 1988, Appl. Spectrosc. 42, 151 (core, ASDF compression) and
// Lampen et al. 1994, Appl. Spectrosc. 48, 1545 (MS labels), as SCIENCE.md §5 summarises them.

/** A peak-table block with the usual EI labels, written in mixed case with `-`, `_` and spaces. */
export const PEAK_TABLE_FILE = `##TITLE=Simulated ketone (test data)
##JCAMP-DX=5.01 $$ invented for tests
##DATA TYPE=MASS SPECTRUM
##DATA CLASS=PEAK TABLE
##ORIGIN=Ionfolio tests
##OWNER=test data
##molform=C 3 H 6 O
##CAS_REGISTRY_NO=00000-00-0
##M-W=58
##.Spectrometer Type=QUADRUPOLE
##.INLET=GC
##.IONIZATION MODE=EI+
##.IONIZATION ENERGY=70 eV
##RETENTION INDEX=503
##XUNITS=M/Z
##YUNITS=RELATIVE ABUNDANCE
##NPOINTS=5
##PEAK TABLE=(XY..XY)
15,10 27,5; 42,8
43,100 $$ base peak
58,25
##END=
`;

/**
 * Compressed XYDATA for ordinates 0 5 12 12 12 40 100 37 8 0 at m/z 10–19:
 * line 1 SQZ @ (0), DIF N (+5) P (+7) % (0), DUP T (that difference twice in all) → 0 5 12 12 12;
 * line 2 starts with the Y check value A2 (12, SQZ), then DIF K8 (+28) O0 (+60) o3 (−63) k9 (−29) q (−8).
 */
export const COMPRESSED_FILE = `##TITLE=Simulated profile, DIF/DUP (test data)
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##DATA CLASS=XYDATA
##XUNITS=M/Z
##YUNITS=RELATIVE ABUNDANCE
##XFACTOR=1
##YFACTOR=0.5
##FIRSTX=10
##LASTX=19
##NPOINTS=10
##XYDATA=(X++(Y..Y))
10@NP%T
14A2K8O0o3k9q
##END=
`;

/** The same ordinates in AFFN and PAC form (signs as delimiters), YFACTOR 1. */
export const AFFN_FILE = `##TITLE=Simulated profile, AFFN/PAC (test data)
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##FIRSTX=10
##LASTX=19
##NPOINTS=10
##XYDATA=(X++(Y..Y))
10 0 5 12 12 12
15+40+100+37+8+0
##END=
`;

/** A LINK block with a structure child and two spectra. */
export const LINK_FILE = `##TITLE=Simulated link (test data)
##JCAMP-DX=5.01
##DATA TYPE=LINK
##BLOCKS=3
##TITLE=structure
##JCAMP-DX=5.01
##DATA TYPE=STRUCTURE
##BLOCK_ID=1
##END=
##TITLE=first spectrum
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##BLOCK_ID=2
##PEAK TABLE=(XY..XY)
43,100 58,25
##END=
##TITLE=second spectrum
##JCAMP-DX=5.01
##DATA TYPE=MASS SPECTRUM
##BLOCK_ID=3
##PEAK TABLE=(XY..XY)
50,20 77,100 105,60
##END=
##END=
`;
