import type { OrderStage } from '@shared/schemas/orders.ts';
import { Badge } from '@/components/ui/badge.tsx';
import { stageLabel, stageTone } from '../stages.ts';

export function StageBadge({ stage }: { stage: OrderStage }) {
  return (
    <Badge tone={stageTone(stage)} className="whitespace-nowrap">
      {stageLabel(stage)}
    </Badge>
  );
}
