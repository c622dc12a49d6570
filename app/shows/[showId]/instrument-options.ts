// The instrument list the forms offer: the shared names of lib/show.
export { INSTRUMENT_OPTIONS, instrumentName } from "@/lib/show/instrument-names";
