// A revision's page has the shape of the list of revisions: a heading over panels.
export { default } from '../(list)/loading';
