import { cliSection } from "./sections/cli";
import { contoursSection } from "./sections/contours";
import { engineGridSection } from "./sections/engine-grid";
import { exposureSection } from "./sections/exposure";
import { ruptureAndWavefieldSection } from "./sections/rupture-and-wavefield";
import { layersSection } from "./sections/layers";
import { serverExposureSection } from "./sections/server-exposure";
import { workerSection } from "./sections/worker";
import type { BenchSection } from "./section";

/** Every benchmark section, in the order `npm run bench` runs them: add one line per new section file. */
export const SECTIONS: BenchSection[] = [
  engineGridSection,
  contoursSection,
  exposureSection,
  ruptureAndWavefieldSection,
  workerSection,
  cliSection,
  layersSection,
  serverExposureSection,
];
