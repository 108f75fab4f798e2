export { CliError, EXIT_PROBLEMS, EXIT_USAGE } from './errors.js';
