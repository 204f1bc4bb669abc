// @ts-nocheck
import { LessonNotFound } from "@/components/lessons/lesson-not-found";

export default LessonNotFound;
