import { useEffect, useMemo, useState } from 'react';
import type { SelectOption } from '@/components/ui/select-field';
import { useTeamQuery } from '@/hooks/api/use-team';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { BoardRow } from '@/shared/types/board';

/**
 * People to filter the board by. Those who may list the people (listPeople) choose from the team; the others, so for them the
 * choice is the holders the board has shown so far.
 */
export function useBoardHolders(rows: BoardRow[]): SelectOption<number>[] {
  const supervisory = usePermissions().may('listPeople');
  const team = useTeamQuery(supervisory);
  const [seen, setSeen] = useState<Map<number, string>>(new Map());
  useEffect(() => {
    if (supervisory) return;
    setSeen((prev) => {
      const fresh = rows.filter((r) => !prev.has(r.holder.id));
      if (!fresh.length) return prev;
      const next = new Map(prev);
      for (const r of fresh) next.set(r.holder.id, r.holder.name);
      return next;
    });
  }, [rows, supervisory]);
  return useMemo(() => {
    const people = supervisory ? (team.data?.items ?? []).map((u) => ({ value: u.id, label: u.name })) : [...seen].map(([value, label]) => ({ value, label }));
    return people.sort((a, b) => a.label.localeCompare(b.label));
  }, [supervisory, team.data, seen]);
}
