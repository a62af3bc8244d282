/** The cabinet engine, run in the browser on every edit (the server stays authoritative on save). */
export { planDesign } from '../../../../shared/cabinet/index';
