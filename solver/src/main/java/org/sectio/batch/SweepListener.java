package org.sectio.batch;

/** Told of a sweep's progress. Called from the worker threads, so implementations synchronize. */
public interface SweepListener {

    /** Ignores everything. */
    SweepListener SILENT = new SweepListener() {
        @Override
        public void started(int toDo, int alreadyRecorded, int inShard) {
        }

        @Override
        public void pointDone(PointRecord record, int done, int failed, int toDo) {
        }
    };

    /**
     * @param toDo points of this shard still to solve
     * @param alreadyRecorded points of this shard found recorded by an earlier run
     * @param inShard points of this shard in all
     */
    void started(int toDo, int alreadyRecorded, int inShard);

    /**
     * @param record the point just recorded
     * @param done points recorded in this run so far (this one included)
     * @param failed how many of them failed
     * @param toDo points this run set out to solve
     */
    void pointDone(PointRecord record, int done, int failed, int toDo);
}
