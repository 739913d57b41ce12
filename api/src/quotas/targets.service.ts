// A project's quota variables and population shares. Saving replaces them as a whole
// in one transaction and recomputes the cells; interviews already logged are kept, and
// categories that disappear are retired rather than deleted so old interviews still read.
import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { parseTargetsCsv, TargetsFormatError } from '../formats/targets-csv.js';
import { EstimationInputError } from '../estimation/errors.js';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { resolveTargets } from '../estimation/joint-targets.js';
import type { MarginTarget } from '../estimation/raking.js';
import { CellAllocator, loadActiveTargets, loadJointTable, variableViews, type VariableView } from './cell-allocator.js';
import { CellsService, type CellView } from './cells.service.js';
import { SaveTargetsDto } from './dto/targets.dto.js';
import { validateAs } from '../common/validation.js';
import { atLine } from './targets-file-lines.js';

export interface TargetsView {
  variables: VariableView[];
  /** Joint shares of the interlocked variables (labels in the variables' order); empty when not given. */
  jointShares: { categories: string[]; share: number }[];
  /** Where the interlocked cells' targets come from; null when nothing is interlocked. */
  interlockBasis: 'joint shares' | 'product of margins' | null;
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
  jointMargins(dto);
}

/**
 * The interlocked variables' margins summed from the joint shares, after checking the table
 * (every combination once, labels of the interlocked variables, margins given alongside within
 * 0.5 points: joint-targets.ts); null when the targets have no joint shares.
 */
export function jointMargins(dto: SaveTargetsDto): Map<string, Map<string, number>> | null {
  if (!dto.jointShares || dto.jointShares.length === 0) return null;
  const interlocked = dto.variables.filter((v) => v.interlocked);
  if (interlocked.length < 2) throw invalid('joint shares need at least two interlocked variables; interlock them, or leave out the joint shares', 'jointShares');
  const names = interlocked.map((v) => v.name.trim());
  const labelsOf = interlocked.map((v) => new Set(v.categories.map((c) => c.label.trim())));
  dto.jointShares.forEach((row, i) => {
    if (row.categories.length !== interlocked.length) {
      throw invalid(`joint share ${i + 1}: name one category of each of ${names.join(', ')}`, `jointShares.${i}.categories`);
    }
    row.categories.forEach((label, v) => {
      if (!labelsOf[v]?.has(label.trim())) {
        throw invalid(`joint share ${i + 1}: "${label.trim()}" is not a category of ${names[v]}`, `jointShares.${i}.categories`);
      }
    });
  });
  for (const [v, labels] of labelsOf.entries()) {
    const clash = [...labels].find((l) => l.includes(JOINT_SEPARATOR.trim()));
    if (clash) throw invalid(`${names[v]}: category "${clash}" contains "${JOINT_SEPARATOR.trim()}", which joint shares use between categories; rename it`, 'jointShares');
  }
  const joint: MarginTarget = {
    variable: names.join(JOINT_SEPARATOR),
    shares: dto.jointShares.map((row) => ({ category: row.categories.map((c) => c.trim()).join(JOINT_SEPARATOR), share: row.share })),
  };
  const margins: MarginTarget[] = interlocked.map((v) => ({
    variable: v.name.trim(),
    shares: v.categories.map((c) => ({ category: c.label.trim(), share: c.share })),
  }));
  try {
    const resolved = resolveTargets([joint, ...margins]);
    return new Map(resolved.margins.map((m) => [m.variable, new Map(m.shares.map((s) => [s.category, s.share]))]));
  } catch (error) {
    if (error instanceof EstimationInputError) throw invalid(`joint shares: ${error.message}`, 'jointShares');
    throw error;
  }
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
    return {
      variables: variableViews(active),
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
    await trx('quota_variables').where({ project_id: projectId }).update({ retired: true });
    await trx('quota_categories').where({ project_id: projectId }).update({ retired: true });
    for (const [position, v] of dto.variables.entries()) {
      const [variable] = await trx('quota_variables')
        .insert({ project_id: projectId, name: v.name.trim(), position, interlocked: Boolean(v.interlocked), retired: false })
        .onConflict(['project_id', 'name'])
        .merge(['position', 'interlocked', 'retired'])
        .returning('*');
      // An interlocked variable with joint shares takes its margin from the table.
      const joint = fromJoint?.get(v.name.trim());
      const shareOf = (c: { label: string; share: number }) => joint?.get(c.label.trim()) ?? c.share;
      const total = v.categories.reduce((s, c) => s + shareOf(c), 0);
      await trx('quota_categories')
        .insert(
          v.categories.map((c, i) => ({
            variable_id: variable!.id,
            project_id: projectId,
            label: c.label.trim(),
            position: i,
            share: shareOf(c) / total,
            retired: false,
          })),
        )
        .onConflict(['variable_id', 'label'])
        .merge(['position', 'share', 'retired']);
    }
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
