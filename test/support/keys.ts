/** Byte sequences of the keys, shared with the workbench's own table. */
export {KEY_BYTES as KEY} from '../../src/ui/keys.js';
