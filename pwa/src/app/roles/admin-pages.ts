// The admin's pages, loaded as one chunk at sign-in.
export { PeoplePage } from '../../features/people/pages/people-page';
