// The project's members now live in lib (the supervisor's interviewers page reads them too).
export { getMembers, memberKeys, membersQueryOptions, useMembers, type Member } from '../../../lib/projects/get-members';
