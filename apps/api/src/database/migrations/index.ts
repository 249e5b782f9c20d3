import { InitialSchema1796162620410 } from './1796162620410-InitialSchema.js';
import { MailOutboxPasswordLinksUploads1796164550524 } from './1796164550524-MailOutboxPasswordLinksUploads.js';
import { SlotLaunchRecord1796200292167 } from './1796200292167-SlotLaunchRecord.js';
import { AuditTrail1796200656653 } from './1796200656653-AuditTrail.js';
import { SlotReverifyAndWaivers1796200677124 } from './1796200677124-SlotReverifyAndWaivers.js';
import { DeckPositionsLandingArea1796201917830 } from './1796201917830-DeckPositionsLandingArea.js';
import { SlotAgreedWeightAndLastStep1796203000000 } from './1796203000000-SlotAgreedWeightAndLastStep.js';
import { LaunchingCycleOnePerShip1796213798790 } from './1796213798790-LaunchingCycleOnePerShip.js';
import { RefreshTokenSession1796213925015 } from './1796213925015-RefreshTokenSession.js';
import { CycleWindReadingAndPosition1796214000000 } from './1796214000000-CycleWindReadingAndPosition.js';
import { CycleDeckHolds1796216225592 } from './1796216225592-CycleDeckHolds.js';
import { CycleRespot1796217149940 } from './1796217149940-CycleRespot.js';
import { AircraftTypeStoresCatalogue1796225154045 } from './1796225154045-AircraftTypeStoresCatalogue.js';
import { LandingAreaInUseDerived1796225353747 } from './1796225353747-LandingAreaInUseDerived.js';
import { SlotLoadBuild1796227583908 } from './1796227583908-SlotLoadBuild.js';
import { SlotDownCatapult1796228372875 } from './1796228372875-SlotDownCatapult.js';
import { AircraftTypeMaxEndSpeed1796229016417 } from './1796229016417-AircraftTypeMaxEndSpeed.js';
import { ShipsOwnTheirData1796240912480 } from './1796240912480-ShipsOwnTheirData.js';
import { SlotArmState1796243880772 } from './1796243880772-SlotArmState.js';
import { AuditEntryShip1796245854530 } from './1796245854530-AuditEntryShip.js';
import { AircraftTypeSettingTables1796262840562 } from './1796262840562-AircraftTypeSettingTables.js';
import { LaunchRecordWholeWind1796277785788 } from './1796277785788-LaunchRecordWholeWind.js';
import { LaunchRecordExcessWind1796280000000 } from './1796280000000-LaunchRecordExcessWind.js';
import { CyclePrerequisiteTicks1796290000000 } from './1796290000000-CyclePrerequisiteTicks.js';
import { AuditEntriesAppendOnly1796292153729 } from './1796292153729-AuditEntriesAppendOnly.js';
import { CatapultReadinessSteps1796300000000 } from './1796300000000-CatapultReadinessSteps.js';
import { AircraftClassDepartures1796301700000 } from './1796301700000-AircraftClassDepartures.js';
import { SettingReadBackAndHoldback1796302400000 } from './1796302400000-SettingReadBackAndHoldback.js';

/** Every migration in the order it runs; add a new one at the end (see DEVELOPERS.md). */
export const migrations = [
  InitialSchema1796162620410,
  MailOutboxPasswordLinksUploads1796164550524,
  SlotLaunchRecord1796200292167,
  AuditTrail1796200656653,
  SlotReverifyAndWaivers1796200677124,
  DeckPositionsLandingArea1796201917830,
  SlotAgreedWeightAndLastStep1796203000000,
  LaunchingCycleOnePerShip1796213798790,
  RefreshTokenSession1796213925015,
  CycleWindReadingAndPosition1796214000000,
  CycleDeckHolds1796216225592,
  CycleRespot1796217149940,
  AircraftTypeStoresCatalogue1796225154045,
  LandingAreaInUseDerived1796225353747,
  SlotLoadBuild1796227583908,
  SlotDownCatapult1796228372875,
  AircraftTypeMaxEndSpeed1796229016417,
  ShipsOwnTheirData1796240912480,
  SlotArmState1796243880772,
  AuditEntryShip1796245854530,
  AircraftTypeSettingTables1796262840562,
  LaunchRecordWholeWind1796277785788,
  LaunchRecordExcessWind1796280000000,
  CyclePrerequisiteTicks1796290000000,
  AuditEntriesAppendOnly1796292153729,
  CatapultReadinessSteps1796300000000,
  AircraftClassDepartures1796301700000,
  SettingReadBackAndHoldback1796302400000,
];
