import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { checkImportText, toPreviewDto } from './import-preview';
import { importFiles, sha256 } from './import-storage';

const SAFE_NAME = /[^\w .()-]+/g;

/** Checks an uploaded CSV, keeps the original file with its checksum and importer, and answers the preview. Bad files store nothing. */
export async function uploadSpeciesImport({ teamId, userId, fileName, bytes, text }: { teamId: number; userId: number; fileName: string; bytes: Buffer; text: string }) {
  const { rows } = await checkImportText({ teamId, text });
  const storageKey = await importFiles.put(teamId, bytes);
  const { sequelize, models } = getDb();
  try {
    const row = await sequelize.transaction(async (transaction) => {
      const created = await models.SpeciesImport.create(
        {
          teamId, fileName: (fileName.replace(SAFE_NAME, '_').slice(0, 200) || 'species.csv'), checksum: sha256(bytes), byteSize: bytes.length,
          rowCount: rows.length, storageKey, importedById: userId,
        },
        { transaction },
      );
      await recordEvent({ teamId, actorId: userId, action: 'species_import.uploaded', targetType: 'species_import', targetId: created.id, data: { rows: rows.length, checksum: created.checksum } }, transaction);
      return created;
    });
    await row.reload({ include: [{ association: 'importedBy', attributes: ['name'] }] });
    return toPreviewDto(row, rows.map((r) => r.dto));
  } catch (error) {
    await importFiles.remove(storageKey);
    throw error;
  }
}

export async function findImport({ teamId, importId }: { teamId: number; importId: number }) {
  const row = Number.isInteger(importId) && importId > 0
    ? await getDb().models.SpeciesImport.findOne({ where: { id: importId, teamId }, include: [{ association: 'importedBy', attributes: ['name'] }] })
    : null;
  if (!row) throw new AppError('NOT_FOUND', 'No such import.');
  return row;
}

/** The original bytes, checked against the checksum taken at upload. */
export async function readImportFile({ teamId, importId }: { teamId: number; importId: number }) {
  const row = await findImport({ teamId, importId });
  const bytes = await importFiles.get(row.storageKey).catch(() => {
    throw new AppError('GONE', 'The stored file is no longer there.');
  });
  if (sha256(bytes) !== row.checksum) throw new AppError('INTERNAL', 'The stored file does not match its checksum; it has been changed since upload.');
  return { row, bytes };
}

/** One import with its rows checked again against the team's species as they are now. */
export async function getSpeciesImport({ teamId, importId }: { teamId: number; importId: number }) {
  const { row, bytes } = await readImportFile({ teamId, importId });
  const { rows } = await checkImportText({ teamId, text: bytes.toString('utf8').replace(/^\uFEFF/, '') });
  return toPreviewDto(row, rows.map((r) => r.dto));
}

export async function listSpeciesImports({ teamId }: { teamId: number }) {
  const rows = await getDb().models.SpeciesImport.findAll({
    where: { teamId }, order: [['id', 'DESC']], limit: 50, include: [{ association: 'importedBy', attributes: ['name'] }],
  });
  return { items: rows.map((r) => toPreviewDto(r, [])) };
}
