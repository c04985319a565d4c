import { ReadingStep } from '@/components/flow/reading-step';

export default function FrontStaticStep() {
  return <ReadingStep end="front" stage="static" />;
}
