/**
 * The terminal model the tests check written bytes against. It lives beside the
 * bench (scripts/bench-support/screen-model.mjs), which uses the same model.
 */
export {VirtualTerminal, applySgr, changedCharacterBytes} from '../../scripts/bench-support/screen-model.mjs';
