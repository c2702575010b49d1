export { FormActions } from './form-actions';
