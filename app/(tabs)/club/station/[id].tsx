// A member's station opened from the club list: the same screen as /stations/[id], kept inside the
// Club tab so "back" returns to the club list.
export { default } from '../../stations/[id]';
