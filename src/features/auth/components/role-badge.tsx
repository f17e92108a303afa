import { Badge, type BadgeTone } from '@/components/ui/badge.tsx';
import type { Role } from '@shared/schemas/auth.ts';

const labels: Record<Role, { text: string; tone: BadgeTone }> = {
  owner: { text: 'Owner', tone: 'brass' },
  maker: { text: 'Maker', tone: 'moss' },
  apprentice: { text: 'Apprentice', tone: 'hide' },
};

/** The member's role in the shop, worded for people. */
export function RoleBadge({ role }: { role: Role }) {
  const label = labels[role];
  return (
    <Badge tone={label.tone} className="!text-[0.7rem]">
      <span className="sr-only">Role: </span>
      <span data-testid="role">{label.text}</span>
    </Badge>
  );
}
