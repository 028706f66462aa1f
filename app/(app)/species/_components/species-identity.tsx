// Who the species is: its drawing (for species known by structure), typeset formula, where its values come from,
// and for structures the SMILES and InChIKey that identify it.
import type { ReactNode } from 'react';
import { FormulaText } from '@/components/chemistry/formula-text';
import { OriginMark } from '@/components/chemistry/origin-mark';
import type { OriginFacts } from '@/components/chemistry/origin-text';
import { StructureImage } from '@/components/chemistry/structure-image';
import type { SpeciesDetailDto } from '@/lib/services/species/get-species';
import { provenanceText } from './species-values';

const DRAWING = { width: 240, height: 180 };

/** The values in use: the team's when it has its own, else the library's, with the σ(ΔfG°) each states. */
export function originOfDetail(detail: SpeciesDetailDto): OriginFacts {
  if (detail.inUse === 'team' && detail.team) {
    return { origin: 'team', source: provenanceText(detail.team), sigma_kJ: detail.team.sigmaDfG_kJ };
  }
  return { origin: 'library', source: detail.builtin?.source ?? null, sigma_kJ: detail.builtin?.uncertainty.dfG_kJ ?? undefined };
}

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-soft">{term}</dt>
      <dd className="min-w-0 text-ink">{children}</dd>
    </>
  );
}

export function SpeciesIdentity({ detail }: { detail: SpeciesDetailDto }) {
  const { team, builtin } = detail;
  const name = team?.name ?? builtin?.name ?? detail.key;
  const formula = team?.formula ?? builtin?.formula ?? null;
  const structure = builtin?.structure;
  const origin = originOfDetail(detail);
  return (
    <section aria-label="Identity" className="flex flex-wrap items-start gap-4 rounded-lg border border-paper-edge bg-white/60 p-3" data-testid="species-identity">
      {structure ? <StructureImage smiles={structure.smiles} name={name} formula={formula} {...DRAWING} /> : null}
      <dl className="grid min-w-[min(100%,18rem)] flex-1 grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
        <Row term="Formula">
          <FormulaText value={detail.key} formula={formula} className="text-base" />
        </Row>
        <Row term="Values">
          <OriginMark facts={origin} />
          {team && builtin ? <span className="ml-2 text-xs text-marginal">your team’s values replace the built-in ones</span> : null}
        </Row>
        <Row term="Source">{origin.source ?? '—'}</Row>
        {structure ? (
          <>
            <Row term="SMILES">
              <span className="break-all font-mono text-xs">{structure.smiles}</span>
            </Row>
            <Row term="InChIKey">
              <span className="break-all text-xs">{structure.inchikey}</span>
            </Row>
            {structure.cas ? <Row term="CAS RN">{structure.cas}</Row> : null}
          </>
        ) : null}
      </dl>
    </section>
  );
}
