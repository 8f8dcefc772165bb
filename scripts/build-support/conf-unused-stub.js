// conf loads a JSON-schema validator (ajv, ajv-formats) and semver for two options
// tapwright never passes: `schema` and `migrations` (settings are validated with
// zod in src/store/settings-schema.ts). The build puts this stub in their place,
// which keeps about 180 KB out of every start. Should conf ever reach them, this
// says so instead of failing quietly.
const why = 'left out of the tapwright build: conf is used without its schema and migrations options';
export class Ajv2020 {
  constructor() {
    throw new Error(`ajv is ${why}`);
  }
}
export default function unused() {
  throw new Error(`this module is ${why}`);
}
export const eq = unused;
export const clean = unused;
export const satisfies = unused;
export const lte = unused;
export const gt = unused;
