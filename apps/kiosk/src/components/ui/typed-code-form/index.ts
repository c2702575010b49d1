export { TypedCodeForm } from './typed-code-form';
