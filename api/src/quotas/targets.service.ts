// A project's quota variables and population shares. Saving replaces them as a whole
// in one transaction and recomputes the cells; interviews already logged are kept, and
// categories that disappear are retired rather than deleted so old interviews still read.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { parseTargetsCsv, TargetsFormatError } from '../formats/targets-csv.js';
import { EstimationInputError } from '../estimation/errors.js';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { resolveTargets } from '../estimation/joint-targets.js';
import { CellAllocator, loadActiveTargets, loadJointTable, variableViews, type ActiveTargets, type VariableView } from './cell-allocator.js';
import { CellsService, type CellView } from './cells.service.js';
import { SaveTargetsDto } from './dto/targets.dto.js';
import { validateAs } from '../common/validation.js';
import { atLine } from './targets-file-lines.js';
import { checkTargets, columnNameOf, invalid, jointMargins } from './targets-check.js';
import { writeTargets } from './targets-save.js';

/** A variable as the set-up screen edits it: with the counted interviews it and each category hold. */
export interface TargetVariableView extends VariableView {
  interviews: number;
  categories: (VariableView['categories'][number] & { interviews: number })[];
}

export interface TargetsView {
  variables: TargetVariableView[];
  /** Joint shares of the interlocked variables (labels in the variables' order); empty when not given. */
  jointShares: { categories: string[]; share: number }[];
  /** Where the interlocked cells' targets come from; null when nothing is interlocked. */
  interlockBasis: 'joint shares' | 'product of margins' | null;
}

/** Interlocked variables keep the joint table's order ahead of the rest; the rest keep theirs. */
function order(interlocked: string[], name: string): number {
  const i = interlocked.indexOf(name);
  return i < 0 ? interlocked.length : i;
}

@Injectable()
export class TargetsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly cells: CellAllocator,
    private readonly counts: CellsService,
  ) {}

  async get(projectId: string): Promise<TargetsView> {
    const { variables: active } = await loadActiveTargets(this.db, projectId);
    const joint = await loadJointTable(this.db, projectId, active);
    const interlocked = active.some((v) => v.interlocked);
    const counts = await this.db('interview_counts').where({ project_id: projectId }).where('n', '>', 0).select('category_ids', 'n');
    const held = (id: string) => counts.reduce((s, g) => s + (g.category_ids.includes(id) ? g.n : 0), 0);
    // A variable holds the interviews of its retired categories too.
    const variableOf = new Map((await this.db('quota_categories').where({ project_id: projectId }).select('id', 'variable_id')).map((c) => [c.id, c.variable_id]));
    const heldByVariable = (id: string) => counts.reduce((s, g) => s + (g.category_ids.some((c) => variableOf.get(c) === id) ? g.n : 0), 0);
    return {
      variables: variableViews(active).map((v) => ({
        ...v,
        categories: v.categories.map((c) => ({ ...c, interviews: held(c.id) })),
        interviews: heldByVariable(v.id),
      })),
      jointShares: joint ? joint.shares.map((s) => ({ categories: s.category.split(JOINT_SEPARATOR), share: s.share })) : [],
      interlockBasis: !interlocked ? null : joint ? 'joint shares' : 'product of margins',
    };
  }

  async save(projectId: string, dto: SaveTargetsDto): Promise<TargetsView> {
    await this.db.transaction((trx) => this.replace(trx, projectId, dto));
    return this.get(projectId);
  }

  /**
   * The cells these targets would give, with the interviews already logged counted in them,
   * worked out by saving in a transaction that is then rolled back: the very rules saving
   * applies, and nothing changes.
   */
  async preview(projectId: string, dto: SaveTargetsDto): Promise<CellView[]> {
    let cells: CellView[] = [];
    const undo = new Error('preview only');
    try {
      await this.db.transaction(async (trx) => {
        await this.replace(trx, projectId, dto);
        cells = await this.counts.cellCounts(projectId, trx);
        throw undo;
      });
    } catch (error) {
      if (error !== undo) throw error;
    }
    return cells;
  }

  private async replace(trx: Knex.Transaction, projectId: string, dto: SaveTargetsDto): Promise<void> {
    checkTargets(dto);
    const fromJoint = jointMargins(dto);
    // One writer per project at a time: syncs and target edits queue behind each other.
    await trx('projects').where({ id: projectId }).forUpdate().first('id');
    await writeTargets(trx, projectId, dto, fromJoint);
    await this.saveJointShares(trx, projectId, dto);
    await this.cells.recompute(projectId, trx);
  }

  private async saveJointShares(trx: Knex.Transaction, projectId: string, dto: SaveTargetsDto): Promise<void> {
    await trx('quota_joint_shares').where({ project_id: projectId }).delete();
    if (!dto.jointShares || dto.jointShares.length === 0) return;
    const interlocked = dto.variables.filter((v) => v.interlocked).map((v) => v.name.trim());
    const { variables } = await loadActiveTargets(trx, projectId);
    const idOf = new Map(variables.flatMap((v) => v.categories.map((c) => [JSON.stringify([v.name, c.label]), c.id] as const)));
    const total = dto.jointShares.reduce((s, row) => s + row.share, 0);
    await trx('quota_joint_shares').insert(
      dto.jointShares.map((row) => ({
        project_id: projectId,
        category_ids: row.categories.map((label, v) => idOf.get(JSON.stringify([interlocked[v], label.trim()])) as string),
        share: row.share / total,
      })),
    );
  }

  /** Reads an uploaded targets file into the shape `save` takes, without saving anything. */
  async parseUpload(projectId: string, file: { buffer: Buffer; originalname?: string } | undefined, interlock = ''): Promise<SaveTargetsDto> {
    const dto = this.readUpload(file, interlock);
    return withSavedIds(dto, (await loadActiveTargets(this.db, projectId)).variables);
  }

  private readUpload(file: { buffer: Buffer; originalname?: string } | undefined, interlock: string): SaveTargetsDto {
    if (!file) throw invalid('attach the targets file as the form field "file"', 'file');
    const text = new TextDecoder('utf-8', { fatal: true });
    let content: string;
    try {
      content = text.decode(file.buffer);
    } catch {
      throw invalid(`${file.originalname ?? 'the file'}: is not UTF-8 text; save it as CSV (UTF-8)`, 'file');
    }
    try {
      const source = file.originalname || 'targets file';
      const parsed = parseTargetsCsv(content, source);
      let resolved;
      try {
        resolved = resolveTargets(parsed.targets);
      } catch (error) {
        if (error instanceof EstimationInputError) throw invalid(`${source}: ${error.message}`, 'file');
        throw error;
      }
      const table = resolved.joint[0];
      if (resolved.joint.length > 1) throw invalid(`${source}: joint shares are given for ${resolved.joint.map((j) => j.variable).join(' and ')}; a project interlocks one set of variables`, 'file');
      let chosen = interlock.split(',').map((s) => s.trim()).filter(Boolean);
      const unknown = chosen.find((name) => !resolved.margins.some((t) => t.variable === name));
      if (unknown) throw invalid(`interlock: unknown variable ${unknown}; the file has ${resolved.margins.map((t) => t.variable).join(', ')}`, 'interlock');
      if (table) {
        const parts = [...(table.parts ?? [])];
        if (chosen.length > 0 && (chosen.length !== parts.length || chosen.some((c) => !parts.includes(c)))) {
          throw invalid(`interlock: ${source} gives joint shares for ${parts.join(' × ')}; interlock exactly those`, 'interlock');
        }
        chosen = parts;
      }
      // Interlocked variables are listed in the joint table's order, so its categories line up.
      const ordered = table ? [...resolved.margins].sort((a, b) => order(chosen, a.variable) - order(chosen, b.variable)) : resolved.margins;
      const dto: SaveTargetsDto = {
        variables: ordered.map((t) => ({
          name: t.variable,
          columnName: columnNameOf({ name: t.variable }),
          interlocked: chosen.includes(t.variable),
          categories: t.shares.map((s) => ({ label: s.category, share: s.share })),
        })),
        ...(table ? { jointShares: table.shares.map((s) => ({ categories: s.category.split(JOINT_SEPARATOR), share: s.share })) } : {}),
      };
      // The very rules saving applies (the request DTO), each problem told by the file's line.
      validateAs(SaveTargetsDto, dto, (p) => atLine(p, source, dto, table, parsed.lineOf));
      checkTargets(dto);
      return dto;
    } catch (error) {
      if (error instanceof TargetsFormatError) throw invalid(error.message, 'file');
      throw error;
    }
  }
}

/**
 * A file's targets matched to the saved ones, so that saving them keeps their identity: a
 * variable by its column name or display name, a category by its label (any case). A matched
 * variable takes its saved display name and column name.
 */
export function withSavedIds(dto: SaveTargetsDto, saved: ActiveTargets['variables']): SaveTargetsDto {
  const lower = (s: string) => s.trim().toLowerCase();
  return {
    ...dto,
    variables: dto.variables.map((v) => {
      const match = saved.find((s) => s.column_name === lower(v.name) || lower(s.name) === lower(v.name) || s.column_name === columnNameOf(v));
      if (!match) return v;
      return {
        ...v,
        id: match.id,
        name: match.name,
        columnName: match.column_name,
        categories: v.categories.map((c) => {
          const category = match.categories.find((k) => lower(k.label) === lower(c.label));
          return category ? { ...c, id: category.id } : c;
        }),
      };
    }),
  };
}
