import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { SpeciesImportCommit } from '../../schemas/species';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { invalidateAfter } from './create-team-species';
import { checkImportText } from './import-preview';
import { importFiles, sha256 } from './import-storage';
import { columnsOf } from './team-species-record';

const MAX_LISTED = 20;

/** Writes every row of a previewed import in one transaction, or nothing: any row error or missing choice refuses it all. */
export async function commitSpeciesImport({ teamId, userId, importId, input }: { teamId: number; userId: number; importId: number; input: SpeciesImportCommit }) {
  const { sequelize, models } = getDb();
  try {
    return await sequelize.transaction(async (transaction) => {
      const imp = await models.SpeciesImport.findOne({ where: { id: importId, teamId }, ...forUpdate(transaction) });
      if (!imp) throw new AppError('NOT_FOUND', 'No such import.');
      if (imp.status === 'committed') throw new AppError('CONFLICT', 'This file has already been imported.');
      const bytes = await importFiles.get(imp.storageKey);
      if (sha256(bytes) !== imp.checksum) throw new AppError('INTERNAL', 'The stored file does not match its checksum; upload it again.');
      // Checked again here: the team's species may have changed since the preview.
      const { rows } = await checkImportText({ teamId, text: bytes.toString('utf8').replace(/^\uFEFF/, ''), transaction });

      const bad = rows.filter((r) => Object.keys(r.dto.errors).length > 0);
      if (bad.length) {
        const listed = bad.slice(0, MAX_LISTED).map((r) => `row ${r.dto.row}: ${Object.values(r.dto.errors).join(' ')}`);
        throw new AppError('UNPROCESSABLE', `${bad.length} row${bad.length > 1 ? 's have' : ' has'} errors, so nothing was imported. Fix the file and upload it again.`, {
          details: { rows: bad.map((r) => ({ row: r.dto.row, errors: r.dto.errors })), listed },
        });
      }
      const undecided = rows.filter((r) => r.duplicate && !input.choices[r.dto.key!] && !input.otherwise);
      if (undecided.length) {
        const fields = Object.fromEntries(undecided.map((r) => [`choices.${r.dto.key}`, `Choose skip or override for ${r.dto.key} (row ${r.dto.row}).`]));
        throw new AppError('VALIDATION', `Choose skip or override for ${undecided.length} duplicate${undecided.length > 1 ? 's' : ''}.`, { fields });
      }

      let created = 0;
      let overridden = 0;
      let skipped = 0;
      for (const { checked, duplicate, dto } of rows) {
        const species = checked.species!;
        const choice = duplicate ? (input.choices[dto.key!] ?? input.otherwise!) : 'create';
        if (choice === 'skip') {
          skipped += 1;
        } else if (duplicate?.of === 'team') {
          const existing = await models.TeamSpecies.findOne({ where: { id: duplicate.teamSpeciesId!, teamId }, transaction });
          await existing!.update({ ...columnsOf(species), importId, version: existing!.version + 1, updatedById: userId }, { transaction });
          overridden += 1;
        } else {
          await models.TeamSpecies.create({ teamId, ...columnsOf(species), importId, createdById: userId, updatedById: userId }, { transaction });
          if (duplicate) overridden += 1;
          else created += 1;
        }
      }
      await imp.update({ status: 'committed', committedAt: new Date(), createdCount: created, overriddenCount: overridden, skippedCount: skipped }, { transaction });
      await recordEvent({ teamId, actorId: userId, action: 'species_import.committed', targetType: 'species_import', targetId: importId, data: { created, overridden, skipped } }, transaction);
      invalidateAfter(teamId, transaction);
      return { id: importId, status: 'committed' as const, created, overridden, skipped };
    });
  } catch (error) {
    // Two commits racing for the same key: the later one finds the index taken and writes nothing.
    if (error instanceof UniqueConstraintError) throw new AppError('CONFLICT', 'Another change to your team’s species landed first; open the import again to see it.');
    throw error;
  }
}
