export { HAZARD_LABELS } from '../../../../shared/constants';
