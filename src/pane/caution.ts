/** The caution every Spanwise surface shows (pane, help, reports): one wording, one place. */
export const CAUTION = "Results are an aid to a qualified engineer, who checks them; local codes and licensed practice govern.";
