// The studies worker: runs one study off the page's thread and reports
// progress after each case. The page ends it (terminate) to stop a study.
import { runStudy, type StudyReply, type StudyRequest } from './run';

const post = (reply: StudyReply) => self.postMessage(reply);

self.onmessage = (event: MessageEvent<StudyRequest>) => {
  post(runStudy(event.data, (done, total) => post({ kind: 'progress', done, total })));
};
