import { router } from 'expo-router';
import { useState } from 'react';

import { createQuote } from '@/hooks/use-quote';

type MakeQuoteOptions = {
  /** Leave the buttons disabled once the quote has opened, so the desk cannot quote the same fresh result twice on coming back. */
  staysBusyAfterOpening?: boolean;
};

/**
 * Makes a draft quote from a saved sizing record and opens it. `making` disables the buttons
 * while the server works; `problem` is its reason when it refuses.
 */
export function useMakeQuote(sizingRecordId: number, { staysBusyAfterOpening = false }: MakeQuoteOptions = {}) {
  const [making, setMaking] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  async function makeQuote() {
    setMaking(true);
    setProblem(null);
    try {
      const quote = await createQuote(sizingRecordId);
      router.push(`/desk/quotes/${quote.id}`);
      if (!staysBusyAfterOpening) setMaking(false);
    } catch (cause) {
      setProblem(cause instanceof Error ? cause.message : 'The quote could not be made.');
      setMaking(false);
    }
  }
  return { making, problem, makeQuote };
}
