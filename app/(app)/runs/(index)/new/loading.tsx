// The same placeholder as the section's list page.
export { default } from "../loading";
