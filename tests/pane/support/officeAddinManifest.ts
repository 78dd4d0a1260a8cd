/** Stand-in for office-addin-manifest in jest (its ESM-only dependencies do not load): office-addin-mock needs only OfficeApp. */
export enum OfficeApp {
  Excel = "excel",
  OneNote = "onenote",
  Outlook = "outlook",
  Project = "project",
  PowerPoint = "powerpoint",
  Word = "word",
}
