// A project's quota variables and population shares. Saving replaces them as a whole
// in one transaction and recomputes the cells; interviews already logged are kept, and
// categories that disappear are retired rather than deleted so old interviews still read.
import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { parseTargetsCsv, TargetsFormatError } from '../formats/targets-csv.js';
import { CellAllocator, loadVariableViews, type VariableView } from './cell-allocator.js';
import type { SaveTargetsDto } from './dto/targets.dto.js';

export interface TargetsView {
  variables: VariableView[];
}

/** The most cells an interlocked cross may have: more cannot be filled by a field team. */
const MAX_CROSSED_CELLS = 2000;

function invalid(message: string, field = 'variables'): BadRequestException {
  return new BadRequestException({ message, fields: [{ field, message }] });
}

export function checkTargets(dto: SaveTargetsDto): void {
  const names = new Set<string>();
  dto.variables.forEach((v, i) => {
    const name = v.name.trim();
    if (names.has(name.toLowerCase())) throw invalid(`variable ${name} is given twice`, `variables.${i}.name`);
    names.add(name.toLowerCase());
    const labels = new Set<string>();
    v.categories.forEach((c, j) => {
      const label = c.label.trim();
      if (labels.has(label.toLowerCase())) {
        throw invalid(`variable ${name}: category "${label}" is given twice`, `variables.${i}.categories.${j}.label`);
      }
      labels.add(label.toLowerCase());
    });
    if (v.categories.every((c) => c.share === 0)) throw invalid(`variable ${name}: all shares are zero`, `variables.${i}.categories`);
  });
  const interlocked = dto.variables.filter((v) => v.interlocked);
  if (interlocked.length === 1) throw invalid('choose at least two variables to interlock, or none');
  const crossed = interlocked.reduce((n, v) => n * v.categories.length, 1);
  if (crossed > MAX_CROSSED_CELLS) {
    throw invalid(`interlocking ${interlocked.map((v) => v.name).join(' × ')} gives ${crossed} cells; at most ${MAX_CROSSED_CELLS} are allowed`);
  }
}

@Injectable()
export class TargetsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly cells: CellAllocator,
  ) {}

  async get(projectId: string): Promise<TargetsView> {
    return { variables: await loadVariableViews(this.db, projectId) };
  }

  async save(projectId: string, dto: SaveTargetsDto): Promise<TargetsView> {
    checkTargets(dto);
    await this.db.transaction(async (trx) => {
      // One writer per project at a time: syncs and target edits queue behind each other.
      await trx('projects').where({ id: projectId }).forUpdate().first('id');
      await trx('quota_variables').where({ project_id: projectId }).update({ retired: true });
      await trx('quota_categories').where({ project_id: projectId }).update({ retired: true });
      for (const [position, v] of dto.variables.entries()) {
        const [variable] = await trx('quota_variables')
          .insert({ project_id: projectId, name: v.name.trim(), position, interlocked: Boolean(v.interlocked), retired: false })
          .onConflict(['project_id', 'name'])
          .merge(['position', 'interlocked', 'retired'])
          .returning('*');
        const total = v.categories.reduce((s, c) => s + c.share, 0);
        await trx('quota_categories')
          .insert(
            v.categories.map((c, i) => ({
              variable_id: variable!.id,
              project_id: projectId,
              label: c.label.trim(),
              position: i,
              share: c.share / total,
              retired: false,
            })),
          )
          .onConflict(['variable_id', 'label'])
          .merge(['position', 'share', 'retired']);
      }
      await this.cells.recompute(projectId, trx);
    });
    return this.get(projectId);
  }

  /** Reads an uploaded targets file into the shape `save` takes, without saving anything. */
  parseUpload(file: { buffer: Buffer; originalname?: string } | undefined, interlock = ''): SaveTargetsDto {
    if (!file) throw invalid('attach the targets file as the form field "file"', 'file');
    const text = new TextDecoder('utf-8', { fatal: true });
    let content: string;
    try {
      content = text.decode(file.buffer);
    } catch {
      throw invalid(`${file.originalname ?? 'the file'}: is not UTF-8 text; save it as CSV (UTF-8)`, 'file');
    }
    try {
      const parsed = parseTargetsCsv(content, file.originalname || 'targets file');
      const chosen = interlock.split(',').map((s) => s.trim()).filter(Boolean);
      const unknown = chosen.find((name) => !parsed.targets.some((t) => t.variable === name));
      if (unknown) throw invalid(`interlock: unknown variable ${unknown}; the file has ${parsed.targets.map((t) => t.variable).join(', ')}`, 'interlock');
      const dto: SaveTargetsDto = {
        variables: parsed.targets.map((t) => ({
          name: t.variable,
          interlocked: chosen.includes(t.variable),
          categories: t.shares.map((s) => ({ label: s.category, share: s.share })),
        })),
      };
      checkTargets(dto);
      return dto;
    } catch (error) {
      if (error instanceof TargetsFormatError) throw invalid(error.message, 'file');
      throw error;
    }
  }
}
