import { useId } from 'react';
import { paths } from '@/config/paths';
import { ButtonLink } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';

/** The way into the field work: find a hose by its tag, or by equipment and position. */
export function FindHoseCard() {
  const titleId = useId();
  return (
    <Card labelledBy={titleId}>
      <CardHeader title="At a hose" titleId={titleId} description="Type the code on its tag, or pick the equipment and position." />
      <CardBody className="flex flex-col gap-3">
        <ButtonLink to={paths.find.getHref()} variant="primary" size="lg" className="w-full justify-center">
          Find a hose
        </ButtonLink>
        <p className="text-sm text-ink-700">
          Before you take a hose out: isolate, lock out and bleed down. Never feel for a leak with your hand.
        </p>
      </CardBody>
    </Card>
  );
}
