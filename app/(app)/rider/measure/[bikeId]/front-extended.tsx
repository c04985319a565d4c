import { ReadingStep } from '@/components/flow/reading-step';

export default function FrontExtendedStep() {
  return <ReadingStep end="front" stage="extended" />;
}
