// A project's page is a heading over a list, like the list of projects.
export { default } from '../(list)/loading';
