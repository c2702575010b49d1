export { Icon, type IconName } from './icon';
