import crypto from 'node:crypto';
import type { Sequelize, Transaction } from 'sequelize';
import {
  getBodyPlan,
  getZone,
  polygonCentroid,
  type BodyPlan,
  type TradeName,
  type Zone,
} from '@/shared/body-plans';
import type { Role } from '@/shared/roles';
import type { CreateFindingRequest } from '@/shared/schemas/finding';
import type { CreateVehicleRequest } from '@/shared/schemas/vehicle';
import type { Config } from '../config';
import {
  Finding,
  Membership,
  Photo,
  Survey,
  User,
  Vehicle,
  VehicleAccess,
  Workshop,
} from '../models';
import type { Pin } from '../models/finding';
import { audit } from '../services/audit';
import { hashPassword } from '../services/passwords';
import { processPhoto } from '../services/photo-processing';
import { readSettings } from '../services/workshops';
import { photoKey } from '../services/photos';
import { createStorage, type StorageAdapter } from '../storage';
import { drawDemoPhoto, type DemoPhotoKind } from './demo-photos';
import { ALDERMOOR_WORK, seedDemoWork, type DemoWork } from './demo-work';

/**
 * An invented scenario: a small coachbuilding workshop with three wood-framed vehicles in for a
 * baseline survey. Every name, make, model and number here is made up.
 */
export const DEMO_ACCOUNTS: { email: string; password: string; role: Role; name: string }[] = [
  {
    email: 'owner@example.test',
    password: 'owner-sound-ash',
    role: 'owner',
    name: 'Maud Ashcombe',
  },
  {
    email: 'inspector@example.test',
    password: 'inspector-sound-ash',
    role: 'inspector',
    name: 'Tobias Venn',
  },
  {
    email: 'applicator@example.test',
    password: 'applicator-sound-ash',
    role: 'applicator',
    name: 'Priya Halloran',
  },
  {
    email: 'client@example.test',
    password: 'client-sound-ash',
    role: 'client',
    name: 'Gideon Marsh',
  },
];

export const DEMO_WORKSHOP_NAME = 'Wyvernmoor Coachworks';

/**
 * A zone picked by key, or else by trade name (and side where it matters), so the seed still
 * finds a fitting member if the plan data is redrawn.
 */
type ZonePick = { key?: string; trade: TradeName | TradeName[]; side?: Zone['side'] };

type DemoFinding = ZonePick &
  Omit<CreateFindingRequest, 'zoneKey' | 'pin' | 'id'> & {
    photo?: { kind: DemoPhotoKind; caption: string };
  };

type DemoVehicle = {
  vehicle: Omit<CreateVehicleRequest, 'id'>;
  sharedWithClient: boolean;
  survey: {
    date: string;
    airTempC: number;
    relativeHumidity: number;
    notAccessible: ZonePick[];
    notAccessibleNotes: string;
    notes: string;
  };
  findings: DemoFinding[];
  /** Member decisions and treatments after the survey (the reports are drawn from them). */
  work?: DemoWork;
};

const ash = 'white-ash';

const VEHICLES: DemoVehicle[] = [
  {
    vehicle: {
      year: 1927,
      make: 'Aldermoor',
      model: 'Fourteen Tourer',
      bodyPlanKey: 'open-tourer-4d',
      chassisNumber: 'AF-27-4418',
      bodyNumber: 'T 1126',
      clientName: 'Gideon Marsh',
      storage: 'covered',
      stage: 'surveying',
      notes:
        'Ash frame under aluminium panels. Spent two winters in an open-sided barn before coming in.',
    },
    sharedWithClient: true,
    work: ALDERMOOR_WORK,
    survey: {
      date: '2026-10-06',
      airTempC: 16.5,
      relativeHumidity: 62,
      notAccessible: [{ trade: 'heel-board' }, { key: 'floor-board-3', trade: 'floor-board' }],
      notAccessibleNotes:
        'Rear floor and heel board under the fixed rear seat pan; seat not removed at this visit. Rear body framing behind the fuel tank not reached; tank left in place.',
      notes:
        'Baseline before any work. Hood down, trim in place. Awl and pin meter used throughout.',
    },
    findings: [
      {
        trade: 'sill',
        side: 'left',
        severity: 4,
        decayType: 'brown-rot',
        activity: 'active',
        moisture: { meterReading: 28, woodTempC: 12, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 30, bottom: 45, left: 20, right: 25 },
        affectedLengthMm: 620,
        atJointOrFitting: true,
        notes:
          'Cubical cracking and shrinkage from the hinge pillar joint rearwards; the awl goes in to the handle. Water was trapped behind the running-board valance.',
        photo: { kind: 'sill-rot', caption: 'Left sill at the hinge pillar, scale bar 50 mm' },
      },
      {
        trade: 'sill',
        side: 'right',
        severity: 2,
        decayType: 'brown-rot',
        activity: 'unknown',
        moisture: { meterReading: 21, woodTempC: 12, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 8, left: 0, right: 4 },
        affectedLengthMm: 180,
        notes: 'Soft underside below the rear door opening; the upper face is still firm.',
      },
      {
        trade: 'hinge-pillar',
        side: 'left',
        severity: 3,
        decayType: 'white-rot',
        activity: 'active',
        moisture: { meterReading: 24, woodTempC: 12, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 22, left: 12, right: 10 },
        affectedLengthMm: 160,
        atJointOrFitting: true,
        notes:
          'Bleached, stringy wood at the foot of the pillar where it tenons into the sill. Hinge screws turn without biting.',
        photo: {
          kind: 'sill-rot',
          caption: 'Foot of the left front hinge pillar, lower hinge removed',
        },
      },
      {
        trade: 'door-rail',
        side: 'left',
        severity: 1,
        decayType: 'unknown',
        activity: 'unknown',
        moisture: { meterReading: 17, woodTempC: 13, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 0, bottom: 2, left: 0, right: 0 },
        affectedLengthMm: 90,
        notes: 'Grey staining and slight softening at the drain slot only.',
      },
      {
        trade: ['tonneau-rail', 'waist-rail'],
        side: 'right',
        severity: 2,
        decayType: 'none',
        insectEvidence: ['frass-powder', 'exit-holes-round'],
        holeDiameterMm: 1.5,
        activity: 'active',
        moisture: { meterReading: 15, woodTempC: 13, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 4, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 300,
        notes:
          'Fresh pale powder on the rail top after the car stood overnight; about a dozen round holes near 1.5 mm.',
        photo: { kind: 'frass', caption: 'Powdery frass below the holes, collected on a card' },
      },
      {
        key: 'cross-member-centre',
        trade: 'cross-member',
        severity: 3,
        decayType: 'brown-rot',
        activity: 'inactive',
        moisture: { meterReading: 18, woodTempC: 12, species: 'white-ash' },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 20, left: 12, right: 0 },
        affectedLengthMm: 260,
        atJointOrFitting: true,
        notes:
          'Dry now, but cracked into cubes on the underside where it is notched over the right sill; an old water track from the floor drain.',
      },
      {
        key: 'tonneau-rail-left',
        trade: 'tonneau-rail',
        side: 'left',
        severity: 2,
        decayType: 'white-rot',
        activity: 'inactive',
        moisture: { meterReading: 16, woodTempC: 13, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 4, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 220,
        notes: 'Bleached, slightly soft top face under the hood-bag strap; firm below 4 mm.',
      },
      {
        key: 'tonneau-rail-rear',
        trade: 'tonneau-rail',
        severity: 2,
        decayType: 'soft-rot',
        activity: 'inactive',
        moisture: { meterReading: 19, woodTempC: 13, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 10, left: 0, right: 0 },
        affectedLengthMm: 260,
        notes: 'Grey, finely checked underside at the centre where rain sat on the tonneau cover.',
      },
      {
        trade: 'seat-frame',
        severity: 0,
        decayType: 'none',
        activity: 'inactive',
        moisture: { meterReading: 12, woodTempC: 14, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
        notes: 'Sound; long fibrous splinter on the pick test. Recorded as a reference reading.',
        photo: { kind: 'sound-ash', caption: 'Front seat frame, sound ash for comparison' },
      },
    ],
  },
  {
    vehicle: {
      year: 1936,
      make: 'Pellworth',
      model: 'Silverline Saloon',
      bodyPlanKey: 'closed-saloon-4d',
      chassisNumber: 'PS-3611-207',
      bodyNumber: 'S 5521',
      clientName: 'Orla Whitcombe',
      storage: 'indoors',
      stage: 'treating',
      notes:
        'Steel-panelled saloon on an ash frame. Roof leaked at the gutter for years; headlining already out.',
    },
    sharedWithClient: false,
    survey: {
      date: '2026-09-15',
      airTempC: 18,
      relativeHumidity: 55,
      notAccessible: [{ trade: 'wheel-arch', side: 'left' }],
      notAccessibleNotes: 'Left rear arch boxed in by a later steel repair panel.',
      notes: 'Headlining out, so the roof frame could be seen from inside.',
    },
    findings: [
      {
        trade: 'roof-rail',
        side: 'left',
        severity: 3,
        decayType: 'brown-rot',
        activity: 'active',
        moisture: { meterReading: 26, woodTempC: 17, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 18, bottom: 6, left: 10, right: 4 },
        affectedLengthMm: 450,
        notes:
          'Below the gutter joint over the rear door. Dark, shrunken and cracked across the grain.',
        photo: { kind: 'roof-rail', caption: 'Left roof rail from inside, gutter leak above' },
      },
      {
        trade: 'roof-slat',
        severity: 2,
        decayType: 'none',
        insectEvidence: ['exit-holes-round', 'frass-powder'],
        holeDiameterMm: 1.8,
        activity: 'inactive',
        moisture: { meterReading: 13, woodTempC: 17, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 3, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 700,
        notes:
          'Old round holes with dark edges and no fresh powder after a week; treat as inactive until rechecked.',
        photo: { kind: 'exit-holes', caption: 'Exit holes in a roof slat, scale bar 50 mm' },
      },
      {
        trade: 'lock-pillar',
        side: 'right',
        severity: 2,
        decayType: 'white-rot',
        activity: 'unknown',
        moisture: { meterReading: 20, woodTempC: 17, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 10, left: 6, right: 0 },
        affectedLengthMm: 120,
        atJointOrFitting: true,
        notes: 'Soft around the striker plate screws at the lower end.',
      },
      {
        trade: 'heel-board',
        severity: 2,
        decayType: 'none',
        insectEvidence: ['exit-holes-oval', 'galleries', 'frass-pellets'],
        holeDiameterMm: 6,
        activity: 'unknown',
        moisture: { meterReading: 14, woodTempC: 17, species: null },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 6, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 250,
        notes:
          'Three oval holes about 6 mm with packed galleries behind the paint. Later softwood replacement board.',
      },
      {
        trade: 'header-rail',
        severity: 0,
        decayType: 'none',
        activity: 'inactive',
        moisture: { meterReading: 11, woodTempC: 17, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0 },
        notes: 'Sound.',
      },
    ],
  },
  {
    vehicle: {
      year: 1951,
      make: 'Dunmarrow',
      model: 'Heathland Estate',
      bodyPlanKey: 'estate-timber',
      chassisNumber: 'DH-51-0093',
      bodyNumber: 'E 207',
      clientName: 'Kestrel Lane Motors',
      storage: 'outdoors',
      stage: 'intake',
      notes:
        'Exposed structural timber at the rear body, varnish failed in patches. Stood outside under a sheet.',
    },
    sharedWithClient: false,
    survey: {
      date: '2026-11-10',
      airTempC: 14,
      relativeHumidity: 70,
      notAccessible: [{ trade: 'floor-board' }],
      notAccessibleNotes: 'Load floor covered by a bonded mat.',
      notes: 'Wet week; readings taken after two days in the shop.',
    },
    findings: [
      {
        key: 'tailgate-bottom-rail',
        trade: ['tailgate-frame', 'boot-frame'],
        severity: 4,
        decayType: 'brown-rot',
        activity: 'active',
        moisture: { meterReading: 30, woodTempC: 11, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 40, left: 30, right: 30 },
        affectedLengthMm: 520,
        atJointOrFitting: true,
        notes:
          'Bottom rail of the tailgate breaks up by hand at both corner joints; the frame racks when opened.',
      },
      {
        trade: 'wheel-arch',
        side: 'right',
        severity: 3,
        decayType: 'soft-rot',
        activity: 'active',
        moisture: { meterReading: 27, woodTempC: 11, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 14, bottom: 0, left: 8, right: 8 },
        affectedLengthMm: 340,
        notes:
          'Surface checked into small cubes when dried with a heat gun; soft to 14 mm behind the spray line.',
      },
      {
        key: 'belt-rail-left',
        trade: ['belt-rail', 'waist-rail'],
        side: 'left',
        severity: 1,
        decayType: 'unknown',
        activity: 'unknown',
        moisture: { meterReading: 19, woodTempC: 11, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 2, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 400,
        notes: 'Dark water staining under failed varnish; firm under the awl.',
      },
      {
        key: 'quarter-pillar-left',
        trade: ['rear-pillar', 'door-stile'],
        side: 'left',
        severity: 1,
        decayType: 'none',
        insectEvidence: ['exit-holes-round', 'frass-powder'],
        holeDiameterMm: 1.2,
        activity: 'unknown',
        moisture: { meterReading: 16, woodTempC: 11, species: ash },
        pickTest: 'long-splinter',
        decayDepthMm: { top: 2, bottom: 0, left: 0, right: 0 },
        affectedLengthMm: 120,
        notes:
          'Five small round holes; a little powder, but it may be old. Card taped below to check.',
      },
      {
        trade: 'sill',
        side: 'right',
        severity: 2,
        decayType: 'brown-rot',
        activity: 'unknown',
        moisture: { meterReading: 22, woodTempC: 11, species: ash },
        pickTest: 'brash-break',
        decayDepthMm: { top: 0, bottom: 12, left: 0, right: 6 },
        affectedLengthMm: 260,
        notes: 'Soft at the rear end where the sill meets the arch.',
        photo: { kind: 'sill-rot', caption: 'Right sill rear end, underside' },
      },
    ],
  },
];

function pickZone(plan: BodyPlan, pick: ZonePick): Zone {
  const exact = pick.key ? getZone(plan, pick.key) : undefined;
  if (exact) return exact;
  const trades = Array.isArray(pick.trade) ? pick.trade : [pick.trade];
  for (const trade of trades) {
    const candidates = plan.zones.filter((z) => z.tradeName === trade);
    const zone = candidates.find((z) => !pick.side || z.side === pick.side) ?? candidates[0];
    if (zone) return zone;
  }
  throw new Error(`Demo seed: body plan ${plan.key} has no ${trades.join(' or ')} zone`);
}

/** A pin at the centroid of the zone's shape, on the view a surveyor would look at it in. */
function pinFor(plan: BodyPlan, zone: Zone): Pin | null {
  const preferred = zone.side === 'centre' ? ['top', 'underside'] : [zone.side, 'top', 'underside'];
  const views = [...plan.views].sort((a, b) => rank(a.key) - rank(b.key));
  function rank(key: string) {
    const i = preferred.indexOf(key);
    return i === -1 ? preferred.length : i;
  }
  for (const view of views) {
    const shape = view.shapes.find((s) => s.zone === zone.key);
    if (shape) {
      const [x, y] = polygonCentroid(shape.points as [number, number][]);
      return { view: view.key, x: Math.round(x * 10) / 10, y: Math.round(y * 10) / 10 };
    }
  }
  return null;
}

/**
 * Seeds the demo workshop when the database has no workshop yet; otherwise does nothing. Rows go
 * in one transaction; photo renditions stored before a failure are deleted again.
 */
export async function seedDemoIfEmpty(
  sequelize: Sequelize,
  config: Pick<Config, 'bcryptCost' | 'storage'>,
  deps: { storage?: StorageAdapter } = {},
): Promise<{ seeded: boolean }> {
  if ((await Workshop.count()) > 0) return { seeded: false };
  const storage = deps.storage ?? createStorage(config.storage);
  const stored: string[] = [];
  // The slow parts (drawing and re-encoding photos, hashing) happen before the transaction opens.
  const hashes = await Promise.all(
    DEMO_ACCOUNTS.map((a) => hashPassword(a.password, config.bcryptCost)),
  );
  const photos = await renderPhotos();
  try {
    return await sequelize.transaction(async (transaction) => {
      // Checked again inside the transaction: a workshop made meanwhile means someone else seeded or signed up.
      if ((await Workshop.count({ transaction })) > 0) return { seeded: false };
      await seed(transaction, storage, stored, hashes, photos);
      return { seeded: true };
    });
  } catch (err) {
    await Promise.allSettled(stored.map((key) => storage.delete(key)));
    throw err;
  }
}

type Rendered = Awaited<ReturnType<typeof processPhoto>>;

/** Every demo photo drawn and re-encoded like an upload, keyed by the finding it belongs to. */
async function renderPhotos(): Promise<Map<DemoFinding, Rendered>> {
  const wanted = VEHICLES.flatMap((v) => v.findings).filter((f) => f.photo);
  const rendered = await Promise.all(
    wanted.map(async (f, i) => processPhoto(await drawDemoPhoto(f.photo!.kind, i + 1))),
  );
  return new Map(wanted.map((f, i) => [f, rendered[i]]));
}

async function seed(
  transaction: Transaction,
  storage: StorageAdapter,
  stored: string[],
  hashes: string[],
  photos: Map<DemoFinding, Rendered>,
) {
  const workshop = await Workshop.create(
    {
      name: DEMO_WORKSHOP_NAME,
      settings: {
        units: 'metric',
        region: 'Temperate maritime, unheated barns',
        labourRatePerHour: 58,
        currency: 'GBP',
      },
    },
    { transaction },
  );
  const people: Record<Role, User> = {} as Record<Role, User>;
  for (const [i, account] of DEMO_ACCOUNTS.entries()) {
    const user = await User.create(
      { email: account.email, name: account.name, passwordHash: hashes[i] },
      { transaction },
    );
    await Membership.create(
      { workshopId: workshop.id, userId: user.id, role: account.role },
      { transaction },
    );
    people[account.role] = user;
  }
  const note = (
    action: string,
    entityType: string,
    entityId: string,
    summary: string,
    actor: User,
  ) =>
    audit(transaction, {
      workshopId: workshop.id,
      actorId: actor.id,
      action,
      entityType,
      entityId,
      summary,
    });
  await note(
    'workshop.create',
    'workshop',
    workshop.id,
    `Created ${workshop.name} (demo data)`,
    people.owner,
  );

  for (const demo of VEHICLES) {
    const plan = getBodyPlan(demo.vehicle.bodyPlanKey);
    if (!plan) throw new Error(`Demo seed: no body plan ${demo.vehicle.bodyPlanKey}`);
    const vehicle = await Vehicle.create(
      { ...demo.vehicle, workshopId: workshop.id, createdById: people.owner.id },
      { transaction },
    );
    await note(
      'vehicle.create',
      'vehicle',
      vehicle.id,
      `Added ${vehicle.year} ${vehicle.make} ${vehicle.model}`,
      people.owner,
    );
    if (demo.sharedWithClient) {
      await VehicleAccess.create(
        {
          workshopId: workshop.id,
          vehicleId: vehicle.id,
          userId: people.client.id,
          grantedById: people.owner.id,
        },
        { transaction },
      );
      await note(
        'vehicle.share',
        'vehicle',
        vehicle.id,
        `Shared ${vehicle.make} ${vehicle.model} with ${people.client.name}`,
        people.owner,
      );
    }
    const { notAccessible, ...surveyFields } = demo.survey;
    // Recorded on the day of the survey, so later treatments and re-checks come after it.
    const recordedAt = new Date(`${demo.survey.date}T10:00:00Z`);
    const survey = await Survey.create(
      {
        createdAt: recordedAt,
        updatedAt: recordedAt,
        ...surveyFields,
        purpose: 'baseline',
        workshopId: workshop.id,
        vehicleId: vehicle.id,
        inspectorId: people.inspector.id,
        notAccessibleZones: [...new Set(notAccessible.map((p) => pickZone(plan, p).key))],
      },
      { transaction },
    );
    await note(
      'survey.create',
      'survey',
      survey.id,
      `Started a baseline survey dated ${survey.date}`,
      people.inspector,
    );

    const created: Finding[] = [];
    for (const demoFinding of demo.findings) {
      const { key, trade, side, photo, ...fields } = demoFinding;
      const zone = pickZone(plan, { key, trade, side });
      const finding = await Finding.create(
        {
          insectEvidence: [],
          holeDiameterMm: null,
          affectedLengthMm: null,
          atJointOrFitting: false,
          notes: '',
          ...fields,
          decayType: fields.decayType ?? 'none',
          activity: fields.activity ?? 'unknown',
          pickTest: fields.pickTest ?? 'not-done',
          decayDepthMm: { top: 0, bottom: 0, left: 0, right: 0, ...fields.decayDepthMm },
          moisture: fields.moisture
            ? {
                meterReading: fields.moisture.meterReading,
                woodTempC: fields.moisture.woodTempC ?? null,
                species: fields.moisture.species ?? null,
              }
            : null,
          zoneKey: zone.key,
          pin: pinFor(plan, zone),
          workshopId: workshop.id,
          vehicleId: vehicle.id,
          surveyId: survey.id,
          authorId: people.inspector.id,
          createdAt: recordedAt,
          updatedAt: recordedAt,
        },
        { transaction },
      );
      created.push(finding);
      await note(
        'finding.create',
        'finding',
        finding.id,
        `Logged severity ${finding.severity} at ${zone.label}`,
        people.inspector,
      );
      const rendered = photos.get(demoFinding);
      if (photo && rendered)
        await addDemoPhoto(
          transaction,
          storage,
          stored,
          finding,
          people.inspector,
          photo.caption,
          rendered,
        );
    }
    if (demo.work)
      await seedDemoWork(transaction, {
        work: demo.work,
        plan,
        vehicle,
        findings: created,
        settings: readSettings(workshop.settings),
        people,
        surveyRecordedAt: recordedAt,
        note,
      });
  }
}

/** Stores both renditions of a rendered demo photo and its row. */
async function addDemoPhoto(
  transaction: Transaction,
  storage: StorageAdapter,
  stored: string[],
  finding: Finding,
  author: User,
  caption: string,
  processed: Rendered,
) {
  const id = crypto.randomUUID();
  const thumbKey = photoKey(finding.workshopId, id, 'thumb');
  const displayKey = photoKey(finding.workshopId, id, 'display');
  stored.push(thumbKey);
  await storage.put(thumbKey, processed.thumb.buffer, 'image/jpeg');
  stored.push(displayKey);
  await storage.put(displayKey, processed.display.buffer, 'image/jpeg');
  await Photo.create(
    {
      id,
      workshopId: finding.workshopId,
      findingId: finding.id,
      uploadedById: author.id,
      width: processed.width,
      height: processed.height,
      thumbKey,
      displayKey,
      bytes: processed.thumb.buffer.length + processed.display.buffer.length,
      caption,
    },
    { transaction },
  );
}
