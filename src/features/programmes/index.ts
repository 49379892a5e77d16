export { AddToProgrammeButton, type AddToProgrammeButtonProps } from './components/add-to-programme-button';
