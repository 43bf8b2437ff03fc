import { parsePeakList, type PeakList } from '@ionfolio/chem';
import { useState } from 'react';
import { useIdentify } from '../api/post-identify';
import { describePeakError } from '../utils/describe-peak-error';
import { buildIdentifyBody, type SearchOptions } from '../utils/search-options';

type Asked = { name: string; peaks: PeakList; limit: number; exclude: string | null };

/**
 * The identify page's search: reads the pasted text, checks the options, posts them, and remembers
 * what was asked beside the answer (the query's name and peaks, the entry left out, the limit).
 */
export function useIdentifySearch() {
  const identify = useIdentify();
  const [problems, setProblems] = useState<{ peaks: string | null; options: string[] }>({ peaks: null, options: [] });
  const [asked, setAsked] = useState<Asked | null>(null);

  const run = (text: string, name: string, options: SearchOptions, exclude: string | null) => {
    let peaks: PeakList;
    try {
      peaks = parsePeakList(text);
    } catch (error) {
      setProblems({ peaks: describePeakError(error, text), options: [] });
      return;
    }
    const built = buildIdentifyBody(peaks, options);
    if (!built.ok) {
      setProblems({ peaks: null, options: built.errors });
      return;
    }
    setProblems({ peaks: null, options: [] });
    const limit = built.value.limit;
    // Leaving an entry out must not leave the list one short: ask for one more.
    const body = exclude ? { ...built.value, limit: Math.min(100, limit + 1) } : built.value;
    setAsked({ name: name.trim() || 'Unknown', peaks, limit, exclude });
    identify.mutate(body);
  };

  return { run, identify, asked, problems, clearPeakProblem: () => setProblems((p) => ({ ...p, peaks: null })) };
}
