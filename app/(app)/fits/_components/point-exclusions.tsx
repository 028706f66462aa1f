'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { COMPACT_INPUT } from '@/components/ui/input-class';
import type { AnalysedPoint } from '@/lib/fits/analyse-fit';
import { ScrollRegion } from '@/components/tables/scroll-region';

const n = (x: number, d = 4) => Number(x.toPrecision(d)).toString();

/** The points as a table: residual, the >3σ mark in words, and leave-out with a reason (or bring back). */
export function PointExclusions({ points, canEdit, isBusy, onChange }: {
  points: AnalysedPoint[];
  canEdit: boolean;
  isBusy: boolean;
  onChange(exclusions: { index: number; reason: string }[]): void;
}) {
  const [drafts, setDrafts] = useState<Record<number, string>>({});
  const current = points.filter((p) => p.excluded).map((p) => ({ index: p.index, reason: p.reason ?? '' }));
  return (
    <ScrollRegion label="Points of the data set">
      <table className="w-full text-sm">
        <caption className="sr-only">Points of the data set</caption>
        <thead>
          <tr className="text-left text-ink-soft">
            <th className="font-medium">#</th>
            <th className="font-medium">T / K</th>
            <th className="font-medium">ln K</th>
            <th className="font-medium">Residual</th>
            <th className="font-medium">In the fit</th>
          </tr>
        </thead>
        <tbody>
          {points.map((p) => (
            <tr key={p.index} className="border-t border-paper-edge align-top">
              <td className="py-1 pr-2">{p.index + 1}</td>
              <td className="py-1 pr-2 tabular-nums">{n(p.T_K, 5)}</td>
              <td className="py-1 pr-2 tabular-nums">{n(p.lnK)}</td>
              <td className="py-1 pr-2 tabular-nums">
                {n(p.residual, 2)}
                {p.outlier ? <span className="ml-1 font-medium text-uphill">▲ over 3σ</span> : null}
              </td>
              <td className="py-1">
                {p.excluded ? (
                  <div className="flex flex-wrap items-center gap-2">
                    <span>□ Left out: {p.reason}</span>
                    {canEdit ? (
                      <Button variant="quiet" disabled={isBusy} onClick={() => onChange(current.filter((e) => e.index !== p.index))}>
                        Bring back
                      </Button>
                    ) : null}
                  </div>
                ) : canEdit ? (
                  <div className="flex flex-wrap items-center gap-2">
                    <input
                      aria-label={`Reason to leave out point ${p.index + 1}`}
                      placeholder="Reason to leave out"
                      className={`${COMPACT_INPUT} max-w-xs`}
                      value={drafts[p.index] ?? ''}
                      onChange={(e) => setDrafts({ ...drafts, [p.index]: e.target.value })}
                    />
                    <Button
                      variant="secondary"
                      disabled={isBusy || !(drafts[p.index] ?? '').trim()}
                      onClick={() => onChange([...current, { index: p.index, reason: drafts[p.index]!.trim() }])}
                    >
                      Leave out
                    </Button>
                  </div>
                ) : (
                  '● yes'
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
