import { aliasedTable, and, asc, desc, eq, inArray, type SQL } from "drizzle-orm";
import type { TestStatus } from "../../../shared/schemas/boil-off-test";
import type { Tx } from "../client";
import { boilOffTestFiles, boilOffTests, designs, users } from "../schema";

export type TestRow = typeof boilOffTests.$inferSelect;
export type TestFileRow = typeof boilOffTestFiles.$inferSelect;
type NewTest = Omit<typeof boilOffTests.$inferInsert, "organizationId">;
type NewTestFile = Omit<typeof boilOffTestFiles.$inferInsert, "organizationId">;
export type TestPatch = Partial<Omit<NewTest, "id" | "designId" | "revision" | "createdAt" | "createdByUserId">>;

const creator = aliasedTable(users, "creator");
const acceptor = aliasedTable(users, "acceptor");

export async function insertTest(db: Tx, organizationId: string, row: NewTest) {
  await db.insert(boilOffTests).values({ ...row, organizationId });
}

/** The list leaves out the analysis and chart JSON: it is read on every Tests and Overview visit. */
export async function listTests(db: Tx, organizationId: string, filter: { designId?: string; status?: TestStatus } = {}) {
  const where: SQL[] = [eq(boilOffTests.organizationId, organizationId)];
  if (filter.designId) where.push(eq(boilOffTests.designId, filter.designId));
  if (filter.status) where.push(eq(boilOffTests.status, filter.status));
  return db
    .select({
      id: boilOffTests.id,
      designId: boilOffTests.designId,
      designName: designs.name,
      revision: boilOffTests.revision,
      stageIndex: boilOffTests.stageIndex,
      stageLabel: boilOffTests.stageLabel,
      vesselLabel: boilOffTests.vesselLabel,
      method: boilOffTests.method,
      status: boilOffTests.status,
      testedAt: boilOffTests.testedAt,
      measuredHeatLeak_W: boilOffTests.measuredHeatLeak_W,
      predictedHeatLeak_W: boilOffTests.predictedHeatLeak_W,
      ratio: boilOffTests.ratio,
      createdBy: creator.name,
      createdAt: boilOffTests.createdAt,
    })
    .from(boilOffTests)
    .innerJoin(designs, eq(designs.id, boilOffTests.designId))
    .leftJoin(creator, eq(creator.id, boilOffTests.createdByUserId))
    .where(and(...where))
    .orderBy(desc(boilOffTests.testedAt))
    .limit(1000);
}

/** With lock, only the test row is locked (not the joined design), so a revision save never waits on it. */
export async function findTest(db: Tx, organizationId: string, id: string, lock = false) {
  const scope = and(eq(boilOffTests.organizationId, organizationId), eq(boilOffTests.id, id));
  if (lock) {
    const [locked] = await db.select({ id: boilOffTests.id }).from(boilOffTests).where(scope).limit(1).for("update");
    if (!locked) return null;
  }
  const [row] = await db
    .select({ test: boilOffTests, designName: designs.name, createdBy: creator.name, acceptedBy: acceptor.name })
    .from(boilOffTests)
    .innerJoin(designs, eq(designs.id, boilOffTests.designId))
    .leftJoin(creator, eq(creator.id, boilOffTests.createdByUserId))
    .leftJoin(acceptor, eq(acceptor.id, boilOffTests.acceptedByUserId))
    .where(scope)
    .limit(1);
  return row ?? null;
}

export async function updateTest(db: Tx, organizationId: string, id: string, patch: TestPatch) {
  await db.update(boilOffTests).set(patch).where(and(eq(boilOffTests.organizationId, organizationId), eq(boilOffTests.id, id)));
}

export async function deleteTest(db: Tx, organizationId: string, id: string) {
  await db.delete(boilOffTests).where(and(eq(boilOffTests.organizationId, organizationId), eq(boilOffTests.id, id)));
}

/** Accepted tests of one design with their analysis, oldest first: the calibration's evidence. */
export async function listAcceptedTestsOfDesign(db: Tx, organizationId: string, designId: string) {
  return db
    .select()
    .from(boilOffTests)
    .where(and(eq(boilOffTests.organizationId, organizationId), eq(boilOffTests.designId, designId), eq(boilOffTests.status, "accepted")))
    .orderBy(asc(boilOffTests.acceptedAt));
}

export async function insertTestFile(db: Tx, organizationId: string, row: NewTestFile) {
  await db.insert(boilOffTestFiles).values({ ...row, organizationId });
}

export async function listTestFiles(db: Tx, organizationId: string, testId: string, kind?: "log" | "attachment") {
  const where = [eq(boilOffTestFiles.organizationId, organizationId), eq(boilOffTestFiles.testId, testId)];
  if (kind) where.push(eq(boilOffTestFiles.kind, kind));
  return db
    .select({ file: boilOffTestFiles, uploadedBy: users.name })
    .from(boilOffTestFiles)
    .leftJoin(users, eq(users.id, boilOffTestFiles.uploadedByUserId))
    .where(and(...where))
    .orderBy(asc(boilOffTestFiles.uploadedAt));
}

export async function findTestFile(db: Tx, organizationId: string, testId: string, fileId: string) {
  const [row] = await db
    .select()
    .from(boilOffTestFiles)
    .where(and(eq(boilOffTestFiles.organizationId, organizationId), eq(boilOffTestFiles.testId, testId), eq(boilOffTestFiles.id, fileId)))
    .limit(1);
  return row ?? null;
}

export async function deleteTestFiles(db: Tx, organizationId: string, ids: string[]) {
  if (ids.length === 0) return;
  await db.delete(boilOffTestFiles).where(and(eq(boilOffTestFiles.organizationId, organizationId), inArray(boilOffTestFiles.id, ids)));
}
