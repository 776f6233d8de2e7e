import type { ProofTestRecord } from '@shared/schemas/assemblies.schema';
import type { Preferences } from '@shared/schemas/auth.schema';
import { formatPressure } from '@shared/units/units';
import { formatDate } from '@/lib/format';
import { Badge } from '@/components/ui/badge';
import { Fact, FactList } from './fact-list';
import { PROOF_TEST_MEDIUM_LABELS } from './labels';

export function holdTime(seconds: number): string {
  if (seconds < 60 || seconds % 60 !== 0) return `${seconds} s`;
  const minutes = seconds / 60;
  return `${minutes} min`;
}

/** The latest proof test kept on the assembly. */
export function ProofTestSummary({ test, units }: { test: ProofTestRecord; units: Preferences }) {
  const passed = test.result === 'pass';
  return (
    <div className="flex flex-col gap-3">
      <p className="flex flex-wrap items-center gap-2">
        <Badge tone={passed ? 'success' : 'danger'}>{passed ? 'Passed' : 'Failed'}</Badge>
        <span className="text-ink-800">on {formatDate(test.testedOn)}</span>
      </p>
      <FactList>
        <Fact label="Held">
          {formatPressure(test.heldPressureKpa, units.pressureUnit)} for {holdTime(test.holdSeconds)}
        </Fact>
        <Fact label="Required">{formatPressure(test.requiredPressureKpa, units.pressureUnit)}</Fact>
        <Fact label="Test medium">{PROOF_TEST_MEDIUM_LABELS[test.medium] ?? test.medium}</Fact>
        <Fact label="Tested by">{test.tester}</Fact>
      </FactList>
    </div>
  );
}
