import { router } from 'expo-router';
import { useState } from 'react';

import { createQuote } from '@/hooks/use-quote';

/**
 * Makes a draft quote from a saved sizing record and opens it. `making` disables the buttons
 * while the server works; `problem` is its reason when it refuses.
 */
export function useMakeQuote(sizingRecordId: number) {
  const [making, setMaking] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  async function makeQuote() {
    setMaking(true);
    setProblem(null);
    try {
      const quote = await createQuote(sizingRecordId);
      router.push(`/desk/quotes/${quote.id}`);
    } catch (cause) {
      setProblem(cause instanceof Error ? cause.message : 'The quote could not be made.');
    } finally {
      // The screen stays in the stack: coming back to it, the desk can make another quote.
      setMaking(false);
    }
  }
  return { making, problem, makeQuote };
}
