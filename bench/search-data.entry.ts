/**
 * Writes the invented teacher-network data sets bench/search.mjs runs on (test/helpers/teacher.ts):
 * usage: node <bundle> FOLDER. Files: teacher.csv and teacher.yml (the calibrated case), and
 * large.csv and large.yml (20,000 rows × 20 inputs, a 10-neuron teacher).
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { TEACHER_CASE, teacherConfigYaml, teacherCsv } from '../test/helpers/teacher.js';

const folder = process.argv[2];
if (!folder) throw new Error('usage: node search-data.js FOLDER');
writeFileSync(join(folder, 'teacher.csv'), teacherCsv(TEACHER_CASE.a));
writeFileSync(join(folder, 'teacher.yml'), teacherConfigYaml('teacher.csv'));
writeFileSync(join(folder, 'large.csv'), teacherCsv({ rows: 20_000, inputs: 20, hidden: 10, seed: 1 }));
writeFileSync(join(folder, 'large.yml'), teacherConfigYaml('large.csv'));
