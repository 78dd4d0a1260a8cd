/** The Spanwise version the pane was built from (package.json; the bundler keeps only this field). */
import packageJson from "../../package.json";

export const PANE_VERSION: string = String(packageJson.version);
